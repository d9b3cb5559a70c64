import { useState, type FormEvent } from 'react';
import { requestChangesSchema } from '../../../../shared/api/portal';
import { Alert, Button, ErrorMessage, Field, Textarea } from '../../../components/ui';
import { useRequestChanges } from '../api/request-changes';

/** Ask the desk for changes to a revision: a message, kept in the order's history. */
export function ChangesForm({ orderId, number }: { orderId: number; number: number }) {
  const ask = useRequestChanges(orderId, number);
  const [message, setMessage] = useState('');
  const [error, setError] = useState<string>();
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = requestChangesSchema.safeParse({ message });
    if (!parsed.success) return setError(parsed.error.issues[0].message);
    setError(undefined);
    ask.mutate(parsed.data, { onSuccess: () => setMessage('') });
  };
  return (
    <form onSubmit={submit} className="space-y-3" noValidate>
      <Field label="What should change?" htmlFor="changes-message" error={error}>
        <Textarea
          id="changes-message"
          rows={3}
          value={message}
          invalid={!!error}
          onChange={(e) => setMessage(e.target.value)}
        />
      </Field>
      {ask.isSuccess ? <Alert tone="success">Sent to the plant’s desk.</Alert> : null}
      {ask.error ? <ErrorMessage error={ask.error} /> : null}
      <Button type="submit" variant="secondary" className="w-full" busy={ask.isPending}>
        Ask for changes
      </Button>
    </form>
  );
}
