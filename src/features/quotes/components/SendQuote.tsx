import { useState } from 'react';
import type { Quote } from '../../../../shared/api/pricing';
import { quoteRecipients, sendQuoteSchema } from '../../../../shared/api/quoteSend';
import { Button, Dialog, ErrorMessage, Spinner } from '../../../components/ui';
import { useBuilder } from '../api/get-builder';
import { useSendQuote } from '../api/send-quote';

/** Props of {@link SendQuote}. */
export interface SendQuoteProps {
  quote: Quote;
  /** The builder company of the order, whose people receive the quote. */
  builder: { id: number; name: string };
}

/**
 * "Send to builder": the desk ticks who gets the quote (the builder's contacts with an e-mail
 * address, and the company's own address); each gets their own e-mail, greeted by name, with the
 * PDF attached.
 */
export function SendQuote({ quote, builder }: SendQuoteProps) {
  const [open, setOpen] = useState(false);
  const company = useBuilder(builder.id, open);
  const send = useSendQuote(quote.orderId, quote.number);
  const recipients = company.data ? quoteRecipients(company.data) : [];
  // Until the desk ticks someone, the first person listed (a contact before the company).
  const [chosen, setChosen] = useState<string[] | null>(null);
  const picked = chosen ?? recipients.slice(0, 1).map((r) => r.email);
  const [problem, setProblem] = useState<string | null>(null);

  const close = () => setOpen(false);
  const toggle = (email: string, on: boolean) => {
    setProblem(null);
    setChosen(on ? [...picked, email] : picked.filter((e) => e !== email));
  };
  const confirm = () => {
    // The same schema as the server: at least one person.
    const parsed = sendQuoteSchema.safeParse({ recipients: picked });
    if (!parsed.success) {
      setProblem(parsed.error.issues[0]?.message ?? 'Choose who gets the quote');
      return;
    }
    send.mutate(parsed.data, { onSuccess: close });
  };

  return (
    <>
      <Button
        onClick={() => {
          send.reset();
          setChosen(null);
          setProblem(null);
          setOpen(true);
        }}
      >
        Send to builder
      </Button>
      <Dialog
        open={open}
        title={`Send quote ${quote.reference}?`}
        onClose={close}
        footer={
          <>
            <Button variant="secondary" onClick={close}>
              Cancel
            </Button>
            <Button busy={send.isPending} disabled={company.isPending} onClick={confirm}>
              {picked.length > 1 ? `Send to ${picked.length} people` : 'Send'}
            </Button>
          </>
        }
      >
        {company.isPending ? (
          <Spinner label="Looking up the builder’s contacts…" />
        ) : (
          <fieldset
            aria-describedby={problem ? 'send-quote-problem' : undefined}
            className="flex flex-col gap-2"
          >
            <legend className="mb-2 text-sm text-sand-800">
              Who at <strong className="font-semibold text-sand-900">{builder.name}</strong> gets
              the quote? Each gets their own e-mail, greeted by name, with the PDF attached.
              {quote.sentAt ? ' It was sent before; they get it again.' : null}
            </legend>
            {recipients.map((r) => (
              <label
                key={r.email}
                className="flex items-start gap-2 rounded border border-sand-200 px-3 py-2 text-sm hover:bg-sand-50"
              >
                <input
                  type="checkbox"
                  className="mt-0.5 size-4 accent-timber-600"
                  checked={picked.includes(r.email)}
                  onChange={(e) => toggle(r.email, e.target.checked)}
                />
                <span>
                  <span className="font-medium text-sand-900">
                    {r.company ? `${r.name} (company address)` : r.name}
                  </span>
                  <span className="block text-sand-700">{r.email}</span>
                </span>
              </label>
            ))}
            {problem ? (
              <p id="send-quote-problem" role="alert" className="text-sm text-danger-700">
                {problem}
              </p>
            ) : null}
          </fieldset>
        )}
        {send.error ? (
          <ErrorMessage className="mt-3" title="The quote was not sent" error={send.error} />
        ) : null}
      </Dialog>
    </>
  );
}
