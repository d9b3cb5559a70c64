import { useState, type FormEvent } from 'react';
import { acceptQuoteSchema } from '../../../../shared/api/portal';
import { Button, ErrorMessage, Field, Input } from '../../../components/ui';
import { useAcceptQuote } from '../api/accept-quote';

/** Accept a revision: the builder types their name and ticks the terms (the shared schema checks both). */
export function AcceptForm({
  orderId,
  number,
  onAccepted,
}: {
  orderId: number;
  number: number;
  onAccepted: () => void;
}) {
  const accept = useAcceptQuote(orderId, number);
  const [name, setName] = useState('');
  const [agree, setAgree] = useState(false);
  const [errors, setErrors] = useState<Record<string, string>>({});
  const submit = (e: FormEvent) => {
    e.preventDefault();
    const parsed = acceptQuoteSchema.safeParse({ name, agree });
    if (!parsed.success) {
      setErrors(Object.fromEntries(parsed.error.issues.map((i) => [String(i.path[0]), i.message])));
      return;
    }
    setErrors({});
    accept.mutate(parsed.data, { onSuccess: onAccepted });
  };
  return (
    <form onSubmit={submit} className="space-y-3" noValidate>
      <Field label="Your full name" htmlFor="accept-name" error={errors.name}>
        <Input
          id="accept-name"
          autoComplete="name"
          value={name}
          invalid={!!errors.name}
          onChange={(e) => setName(e.target.value)}
        />
      </Field>
      <label className="flex items-start gap-2 text-sm">
        <input
          type="checkbox"
          className="mt-1 h-5 w-5"
          checked={agree}
          onChange={(e) => setAgree(e.target.checked)}
        />
        <span>I accept this quote, its terms and its cautions on behalf of my company.</span>
      </label>
      {errors.agree ? <p className="text-sm text-danger-700">{errors.agree}</p> : null}
      {accept.error ? <ErrorMessage error={accept.error} /> : null}
      <Button type="submit" className="w-full" busy={accept.isPending}>
        Accept quote
      </Button>
    </form>
  );
}
