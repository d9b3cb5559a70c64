import { useState } from 'react';
import type { OrderDetail } from '../../../../shared/api/orders';
import { promisedDateSchema } from '../../../../shared/api/production';
import { Field, Input, Textarea, fieldDescriptionIds } from '../../../components/ui';
import { useSetPromisedDate } from '../api/set-promised-date';
import { ActionDialog, fieldErrors, issuesOf } from './ActionDialog';

/** The desk sets the promised delivery date, or changes it with a reason the builder is sent. */
export function PromiseDialog({
  order,
  open,
  onClose,
  onDone,
}: {
  order: OrderDetail;
  open: boolean;
  onClose: () => void;
  onDone: (message: string) => void;
}) {
  const save = useSetPromisedDate(order.id);
  const [promisedOn, setPromisedOn] = useState(order.promisedOn ?? '');
  const [reason, setReason] = useState('');
  const [own, setOwn] = useState<Record<string, string>>({});
  const changing = order.promisedOn !== null;
  const errors = fieldErrors(own, save.error);
  const hint = changing ? `Now promised for ${order.promisedOn}.` : undefined;

  const submit = () => {
    const parsed = promisedDateSchema.safeParse({ promisedOn, reason, version: order.version });
    const mine = parsed.success ? {} : issuesOf(parsed.error);
    if (changing && reason.trim().length < 3) mine.reason ??= 'Give a reason';
    setOwn(mine);
    if (!parsed.success || Object.keys(mine).length) return;
    save.mutate(parsed.data, {
      onSuccess: () => {
        onDone(
          changing
            ? `Promised delivery moved to ${promisedOn}; the builder is e-mailed.`
            : `Delivery promised for ${promisedOn}.`,
        );
        onClose();
      },
    });
  };

  return (
    <ActionDialog
      open={open}
      title={changing ? `Change the promised date of ${order.number}` : `Promise a delivery date`}
      submitLabel={changing ? 'Change date' : 'Promise date'}
      onClose={onClose}
      onSubmit={submit}
      busy={save.isPending}
      error={save.error}
    >
      <Field label="Promised delivery" htmlFor="promised-on" error={errors.promisedOn}>
        <Input
          id="promised-on"
          type="date"
          value={promisedOn}
          invalid={Boolean(errors.promisedOn)}
          aria-describedby={fieldDescriptionIds('promised-on', errors.promisedOn)}
          onChange={(e) => setPromisedOn(e.target.value)}
        />
      </Field>
      <Field
        label={changing ? 'Reason (sent to the builder)' : 'Note (optional)'}
        htmlFor="promise-reason"
        error={errors.reason}
        hint={hint}
      >
        <Textarea
          id="promise-reason"
          value={reason}
          rows={2}
          invalid={Boolean(errors.reason)}
          aria-describedby={fieldDescriptionIds('promise-reason', errors.reason, hint)}
          onChange={(e) => setReason(e.target.value)}
        />
      </Field>
    </ActionDialog>
  );
}
