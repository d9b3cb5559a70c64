import { useState } from 'react';
import { deliverySchema } from '../../../../shared/api/production';
import { Field, Input, Textarea, fieldDescriptionIds } from '../../../components/ui';
import { useSignOffDelivery } from '../api/sign-off-delivery';
import { ActionDialog, fieldErrors, issuesOf } from './ActionDialog';

/** Now as a `datetime-local` value (the device's local time, to the minute). */
const localNow = () => {
  const d = new Date();
  d.setMinutes(d.getMinutes() - d.getTimezoneOffset());
  return d.toISOString().slice(0, 16);
};

/** The delivery sign-off: who received the trusses on site, when, and a note. */
export function DeliveryDialog({
  order,
  open,
  onClose,
  onDone,
}: {
  order: { id: number; number: string; version: number };
  open: boolean;
  onClose: () => void;
  onDone: (message: string) => void;
}) {
  const sign = useSignOffDelivery(order.id);
  const [receivedBy, setReceivedBy] = useState('');
  const [receivedAt, setReceivedAt] = useState(localNow);
  const [note, setNote] = useState('');
  const [own, setOwn] = useState<Record<string, string>>({});
  const errors = fieldErrors(own, sign.error);

  const submit = () => {
    const at = receivedAt ? new Date(receivedAt) : null;
    const parsed = deliverySchema.safeParse({
      receivedBy,
      receivedAt: at && !Number.isNaN(at.getTime()) ? at.toISOString() : undefined,
      note,
      version: order.version,
    });
    setOwn(parsed.success ? {} : issuesOf(parsed.error));
    if (!parsed.success) return;
    sign.mutate(parsed.data, {
      onSuccess: () => {
        onDone(`Order ${order.number} is delivered, signed for by ${parsed.data.receivedBy}.`);
        onClose();
      },
    });
  };

  return (
    <ActionDialog
      open={open}
      title={`Sign off the delivery of ${order.number}`}
      submitLabel="Sign off delivery"
      onClose={onClose}
      onSubmit={submit}
      busy={sign.isPending}
      error={sign.error}
    >
      <Field label="Received by (name as signed)" htmlFor="received-by" error={errors.receivedBy}>
        <Input
          id="received-by"
          value={receivedBy}
          autoComplete="off"
          invalid={Boolean(errors.receivedBy)}
          aria-describedby={fieldDescriptionIds('received-by', errors.receivedBy)}
          onChange={(e) => setReceivedBy(e.target.value)}
        />
      </Field>
      <Field label="Received at" htmlFor="received-at" error={errors.receivedAt}>
        <Input
          id="received-at"
          type="datetime-local"
          value={receivedAt}
          invalid={Boolean(errors.receivedAt)}
          aria-describedby={fieldDescriptionIds('received-at', errors.receivedAt)}
          onChange={(e) => setReceivedAt(e.target.value)}
        />
      </Field>
      <Field label="Note (optional)" htmlFor="delivery-note" error={errors.note}>
        <Textarea
          id="delivery-note"
          value={note}
          rows={2}
          placeholder="Where it was left, anything damaged or short"
          invalid={Boolean(errors.note)}
          aria-describedby={fieldDescriptionIds('delivery-note', errors.note)}
          onChange={(e) => setNote(e.target.value)}
        />
      </Field>
    </ActionDialog>
  );
}
