import type { ReactNode } from 'react';
import type { z } from 'zod';
import { isApiError } from '../../../lib/api-client';
import { Button, Dialog, ErrorMessage } from '../../../components/ui';

/** Field messages of a failed parse (first issue per field). */
export function issuesOf(error: z.ZodError): Record<string, string> {
  const out: Record<string, string> = {};
  for (const i of error.issues) out[String(i.path[0] ?? '')] ??= i.message;
  return out;
}

/** Field messages to show: the form's own, else the server's `fields`. */
export function fieldErrors(own: Record<string, string>, error: unknown): Record<string, string> {
  return Object.keys(own).length ? own : isApiError(error) ? (error.fields ?? {}) : {};
}

/** Props of {@link ActionDialog}. */
export interface ActionDialogProps {
  open: boolean;
  title: string;
  submitLabel: string;
  onClose: () => void;
  onSubmit: () => void;
  busy: boolean;
  /** The mutation's error: a 409 `stale` says the order changed and the page now shows it. */
  error: unknown;
  tone?: 'primary' | 'danger';
  children: ReactNode;
}

/** A small form in a dialog for one production change of an order. */
export function ActionDialog(p: ActionDialogProps) {
  const stale = isApiError(p.error) && p.error.code === 'stale';
  const formId = `form-${p.submitLabel.replace(/\W+/g, '-').toLowerCase()}`;
  return (
    <Dialog
      open={p.open}
      title={p.title}
      onClose={p.onClose}
      footer={
        <>
          <Button variant="secondary" onClick={p.onClose}>
            Cancel
          </Button>
          <Button type="submit" form={formId} busy={p.busy} variant={p.tone ?? 'primary'}>
            {p.submitLabel}
          </Button>
        </>
      }
    >
      <form
        id={formId}
        noValidate
        className="flex flex-col gap-4"
        onSubmit={(e) => {
          e.preventDefault();
          p.onSubmit();
        }}
      >
        {p.children}
        {p.error ? (
          <ErrorMessage
            title={stale ? 'Someone changed this order meanwhile' : 'That did not work'}
            error={
              stale
                ? new Error('The page now shows the order as it is. Check it, then try again.')
                : p.error
            }
          />
        ) : null}
      </form>
    </Dialog>
  );
}
