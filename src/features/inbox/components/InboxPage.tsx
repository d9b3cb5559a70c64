import { Fragment, useState } from 'react';
import type { MailMessage } from '../../../../shared/api/pricing';
import {
  Alert,
  Button,
  Card,
  EmptyState,
  ErrorMessage,
  PageHeader,
  Spinner,
  focusRing,
} from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';
import { formatDateTime } from '../../../lib/format';
import { useMail } from '../api/list-mail';
import { formatSize, newestFirst } from '../mail-order';

function MessageRow({ message }: { message: MailMessage }) {
  const [open, setOpen] = useState(false);
  const bodyId = `mail-${message.id}-text`;
  return (
    <Fragment>
      <tr className="align-top hover:bg-sand-50">
        <td className="px-4 py-2.5 whitespace-nowrap text-sand-700">
          {formatDateTime(message.receivedAt)}
        </td>
        <td className="px-4 py-2.5 break-all text-sand-800">{message.to.join(', ')}</td>
        <td className="px-4 py-2.5">
          <button
            type="button"
            aria-expanded={open}
            aria-controls={bodyId}
            onClick={() => setOpen((v) => !v)}
            className={`flex items-start gap-2 rounded text-left font-medium text-timber-700 hover:underline ${focusRing}`}
          >
            <span aria-hidden="true" className="w-3 shrink-0 text-sand-600">
              {open ? '▾' : '▸'}
            </span>
            <span>{message.subject || '(no subject)'}</span>
          </button>
        </td>
        <td className="px-4 py-2.5 text-sand-700">
          {message.attachments.length ? (
            <ul>
              {message.attachments.map((file, index) => (
                <li key={`${file.filename}-${index}`} className="break-all">
                  {file.filename}{' '}
                  <span className="text-xs whitespace-nowrap text-sand-600">
                    ({formatSize(file.size)})
                  </span>
                </li>
              ))}
            </ul>
          ) : (
            <span className="text-sand-600">None</span>
          )}
        </td>
      </tr>
      {open ? (
        <tr id={bodyId} className="bg-sand-50">
          <td colSpan={4} className="px-4 pt-1 pb-4">
            <p className="mb-2 text-xs text-sand-600">From {message.from}</p>
            <pre className="max-h-96 overflow-auto rounded border border-sand-200 bg-white p-3 text-sm whitespace-pre-wrap text-sand-900">
              {message.text || '(no text part)'}
            </pre>
          </td>
        </tr>
      ) : null}
    </Fragment>
  );
}

function MessageTable({ messages }: { messages: MailMessage[] }) {
  if (messages.length === 0) {
    return (
      <EmptyState title="No messages yet">
        Mail the app sends (a quote to a builder, for instance) shows up here.
      </EmptyState>
    );
  }
  return (
    <div className="overflow-x-auto">
      <table className="w-full border-collapse text-left text-sm">
        <caption className="sr-only">Messages held by the local mail fake, newest first</caption>
        <thead className="bg-sand-100 text-xs font-semibold tracking-wide text-sand-700 uppercase">
          <tr>
            <th scope="col" className="px-4 py-2.5">
              Received
            </th>
            <th scope="col" className="px-4 py-2.5">
              To
            </th>
            <th scope="col" className="px-4 py-2.5">
              Subject
            </th>
            <th scope="col" className="px-4 py-2.5">
              Attachments
            </th>
          </tr>
        </thead>
        <tbody className="divide-y divide-sand-200">
          {newestFirst(messages).map((message) => (
            <MessageRow key={message.id} message={message} />
          ))}
        </tbody>
      </table>
    </div>
  );
}

/** `/inbox` (plant manager, demo mode): what the local SMTP fake holds instead of sending it on. */
export function InboxPage() {
  const mail = useMail();
  const noFake = isApiError(mail.error) && mail.error.status === 404;
  return (
    <>
      <PageHeader
        title="Demo inbox"
        description="Mail the app has sent, kept by the local mail fake instead of being delivered."
        actions={
          <Button variant="secondary" busy={mail.isFetching} onClick={() => void mail.refetch()}>
            Refresh
          </Button>
        }
      />
      <Alert className="mb-4">
        This page exists only in demo mode, while the app runs its local mail fake. With a real mail
        relay set up, messages go to their addresses and nothing is kept here.
      </Alert>
      <Card title="Messages" flush>
        {mail.isPending ? (
          <Spinner className="p-4" label="Loading messages…" />
        ) : noFake ? (
          <Alert tone="warning" className="m-4" title="No local mail fake is running">
            The server is not running its local mail fake (it sends through a real relay, or demo
            mode is off), so there is no demo inbox to show.
          </Alert>
        ) : mail.error || !mail.data ? (
          <ErrorMessage
            className="m-4"
            title="Could not load the messages"
            error={mail.error}
            onRetry={() => void mail.refetch()}
          />
        ) : (
          <MessageTable messages={mail.data.items} />
        )}
      </Card>
    </>
  );
}
