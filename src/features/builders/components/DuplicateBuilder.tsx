import { Alert, Button, TextLink } from '../../../components/ui';
import { isApiError } from '../../../lib/api-client';

/** The existing builder a new one may duplicate, from a 409 `possible_duplicate`, or null. */
export function duplicateOf(error: unknown): { id: number; message: string } | null {
  if (!isApiError(error) || error.code !== 'possible_duplicate') return null;
  const id = Number(error.fields?.existingId);
  return Number.isInteger(id) && id > 0 ? { id, message: error.message } : null;
}

/** Asks before a builder is created twice: open the existing one, or create this one anyway. */
export function DuplicateBuilder({
  error,
  busy,
  onCreateAnyway,
}: {
  error: unknown;
  busy: boolean;
  onCreateAnyway: () => void;
}) {
  const dup = duplicateOf(error);
  if (!dup) return null;
  return (
    <Alert tone="warning" title="This builder may already exist" className="mb-4">
      <p>{dup.message}</p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <TextLink to={`/builders/${dup.id}`}>Open the existing builder</TextLink>
        <Button size="sm" variant="secondary" busy={busy} onClick={onCreateAnyway}>
          Create anyway
        </Button>
      </div>
    </Alert>
  );
}
