import { zodResolver } from '@hookform/resolvers/zod';
import { useState } from 'react';
import { useForm } from 'react-hook-form';
import { omit, type z } from 'zod/mini';
import { offlinePaymentSchema, type OfflinePaymentInput } from '../../../../shared/api/portal';
import {
  Alert,
  Button,
  ErrorMessage,
  Field,
  Input,
  Select,
  fieldDescriptionIds,
} from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { useRecordPayment } from '../api/record-payment';
import { formatAmount } from '../money';

/** What the desk types: the route's schema without the order version, which the page adds. */
const formSchema = omit(offlinePaymentSchema, { version: true });
type Values = z.input<typeof formSchema>;
const FIELDS = ['amount', 'method', 'reference'] as const;

/** Props of {@link OfflinePaymentForm}. */
export interface OfflinePaymentFormProps {
  orderId: number;
  currency: string;
  /** The order's version the desk sees; a payment (or any change) recorded meanwhile answers 409. */
  version: number;
  /** Offered as the amount: the deposit still due, else the balance. */
  suggested: number;
}

/**
 * "Record offline payment": a cheque, transfer or cash the desk received, with its reference.
 * Validated with the route's own schema; the server's messages go beside their fields.
 */
export function OfflinePaymentForm({
  orderId,
  currency,
  version,
  suggested,
}: OfflinePaymentFormProps) {
  const record = useRecordPayment(orderId);
  const [done, setDone] = useState<string | null>(null);
  const {
    register,
    handleSubmit,
    reset,
    setError,
    formState: { errors },
  } = useForm<Values, unknown, Omit<OfflinePaymentInput, 'version'>>({
    resolver: zodResolver(formSchema),
    defaultValues: {
      amount: suggested > 0 ? suggested : undefined,
      method: 'cheque',
      reference: '',
    },
  });

  const onSubmit = handleSubmit((values) => {
    setDone(null);
    record.mutate(
      { ...values, version },
      {
        onSuccess: (p) => {
          setDone(
            `${formatAmount(p.amount, p.currency)} by ${p.method} recorded, receipt ${p.receiptNumber ?? ''}. The builder is e-mailed the receipt.`,
          );
          reset({ amount: undefined, method: values.method, reference: '' });
        },
        onError: (error) => {
          if (!isApiError(error)) return;
          for (const f of FIELDS) {
            const message = error.fields[f];
            if (message) setError(f, { type: 'server', message });
          }
        },
      },
    );
  });

  const err = {
    amount: errors.amount?.message,
    method: errors.method?.message,
    reference: errors.reference?.message,
  };
  // A message beside a field says it all; any other refusal (409 `stale`) shows above the button.
  const failure = record.error;
  const hasFieldErrors = isApiError(failure) && FIELDS.some((f) => failure.fields[f]);

  return (
    <form
      onSubmit={onSubmit}
      noValidate
      aria-labelledby="offline-payment-title"
      className="print:hidden"
    >
      <h3 id="offline-payment-title" className="mb-3 text-base font-semibold text-sand-900">
        Record offline payment
      </h3>
      <div className="grid gap-4 sm:grid-cols-[10rem_10rem_1fr_auto] sm:items-start">
        <Field label={`Amount (${currency})`} htmlFor="offline-amount" error={err.amount}>
          <Input
            id="offline-amount"
            type="number"
            inputMode="decimal"
            step="0.01"
            min={0}
            className="text-right tabular-nums"
            invalid={!!err.amount}
            aria-describedby={fieldDescriptionIds('offline-amount', err.amount)}
            {...register('amount', { valueAsNumber: true })}
          />
        </Field>
        <Field label="Method" htmlFor="offline-method" error={err.method}>
          <Select
            id="offline-method"
            invalid={!!err.method}
            aria-describedby={fieldDescriptionIds('offline-method', err.method)}
            {...register('method')}
          >
            <option value="cheque">Cheque</option>
            <option value="transfer">Bank transfer</option>
            <option value="cash">Cash</option>
          </Select>
        </Field>
        <Field
          label="Reference"
          htmlFor="offline-reference"
          error={err.reference}
          hint="Cheque number or the transfer's reference"
        >
          <Input
            id="offline-reference"
            autoComplete="off"
            maxLength={120}
            invalid={!!err.reference}
            aria-describedby={fieldDescriptionIds(
              'offline-reference',
              err.reference,
              "Cheque number or the transfer's reference",
            )}
            {...register('reference')}
          />
        </Field>
        <div className="sm:pt-7">
          <Button type="submit" busy={record.isPending}>
            Record payment
          </Button>
        </div>
      </div>
      {done ? (
        <Alert tone="success" className="mt-3">
          {done}
        </Alert>
      ) : null}
      {record.error && !hasFieldErrors ? (
        <ErrorMessage className="mt-3" title="The payment was not recorded" error={record.error} />
      ) : null}
    </form>
  );
}
