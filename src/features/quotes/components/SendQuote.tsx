import { useState } from 'react';
import type { Quote } from '../../../../shared/api/pricing';
import { Button, Dialog, ErrorMessage, Spinner } from '../../../components/ui';
import { useBuilder } from '../api/get-builder';
import { useSendQuote } from '../api/send-quote';

/** Props of {@link SendQuote}. */
export interface SendQuoteProps {
  quote: Quote;
  /** The builder company of the order, whose e-mail address receives the quote. */
  builder: { id: number; name: string };
}

/** "Send to builder": a confirm dialog naming the address, then the e-mail with the PDF. */
export function SendQuote({ quote, builder }: SendQuoteProps) {
  const [open, setOpen] = useState(false);
  const company = useBuilder(builder.id, open);
  const send = useSendQuote(quote.orderId, quote.number);
  const address = company.data?.email;

  const close = () => setOpen(false);
  const confirm = () => send.mutate(undefined, { onSuccess: close });

  return (
    <>
      <Button
        onClick={() => {
          send.reset();
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
              Send
            </Button>
          </>
        }
      >
        {company.isPending ? (
          <Spinner label="Looking up the builder’s address…" />
        ) : (
          <p>
            The quote goes by e-mail to{' '}
            <strong className="font-semibold text-sand-900">
              {address ?? 'the builder company’s address'}
            </strong>{' '}
            ({builder.name}), with the PDF attached.
            {quote.sentAt ? ' It was sent before; they get it again.' : null}
          </p>
        )}
        {send.error ? (
          <ErrorMessage className="mt-3" title="The quote was not sent" error={send.error} />
        ) : null}
      </Dialog>
    </>
  );
}
