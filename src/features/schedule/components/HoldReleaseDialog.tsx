import { useState } from 'react';
import { holdSchema } from '../../../../shared/api/production';
import { Field, Textarea, fieldDescriptionIds } from '../../../components/ui';
import { useHoldOrder } from '../api/hold-order';
import { useReleaseOrder } from '../api/release-order';
import { ActionDialog, fieldErrors, issuesOf } from './ActionDialog';

const TEXT = {
  hold: {
    title: (n: string) => `Hold order ${n}`,
    submit: 'Hold order',
    hint: 'It leaves the schedule and is not released by itself until you release it.',
    done: (n: string) => `Order ${n} is on hold.`,
  },
  release: {
    title: (n: string) => `Release order ${n}`,
    submit: 'Release order',
    hint: 'Overrides a hold and the deposit, never the design review.',
    done: (n: string) => `Order ${n} is released to production.`,
  },
};

/** The plant manager holds an order, or releases it by hand, with a reason. */
export function HoldReleaseDialog({
  mode,
  order,
  open,
  onClose,
  onDone,
}: {
  mode: 'hold' | 'release';
  order: { id: number; number: string; version: number };
  open: boolean;
  onClose: () => void;
  onDone: (message: string) => void;
}) {
  const hold = useHoldOrder(order.id);
  const release = useReleaseOrder(order.id);
  const action = mode === 'hold' ? hold : release;
  const [reason, setReason] = useState('');
  const [own, setOwn] = useState<Record<string, string>>({});
  const errors = fieldErrors(own, action.error);
  const t = TEXT[mode];

  const submit = () => {
    const parsed = holdSchema.safeParse({ reason, version: order.version });
    setOwn(parsed.success ? {} : issuesOf(parsed.error));
    if (!parsed.success) return;
    action.mutate(parsed.data, {
      onSuccess: () => {
        onDone(t.done(order.number));
        onClose();
      },
    });
  };

  return (
    <ActionDialog
      open={open}
      title={t.title(order.number)}
      submitLabel={t.submit}
      tone={mode === 'hold' ? 'danger' : 'primary'}
      onClose={onClose}
      onSubmit={submit}
      busy={action.isPending}
      error={action.error}
    >
      <Field label="Reason" htmlFor={`${mode}-reason`} error={errors.reason} hint={t.hint}>
        <Textarea
          id={`${mode}-reason`}
          value={reason}
          rows={2}
          invalid={Boolean(errors.reason)}
          aria-describedby={fieldDescriptionIds(`${mode}-reason`, errors.reason, t.hint)}
          onChange={(e) => setReason(e.target.value)}
        />
      </Field>
    </ActionDialog>
  );
}
