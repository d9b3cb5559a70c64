import { useState, type ReactNode } from 'react';
import { Alert } from './Alert';
import { Button } from './Button';
import { Card } from './Card';

/** What the edit form gets: call `saved` after a successful save, `cancel` to go back. */
export interface EditInPlaceControls {
  saved: () => void;
  cancel: () => void;
}

/** Props of {@link EditInPlace}. */
export interface EditInPlaceProps {
  title: string;
  editTitle: string;
  /** The edit button's text ("Edit details"). */
  editLabel: string;
  canEdit: boolean;
  /** Shown above the card after a save. */
  savedMessage: string;
  form: (controls: EditInPlaceControls) => ReactNode;
  /** The read-only view. */
  children: ReactNode;
}

/** A card that shows a record and, for those who may, swaps to its edit form in place. */
export function EditInPlace({
  title,
  editTitle,
  editLabel,
  canEdit,
  savedMessage,
  form,
  children,
}: EditInPlaceProps) {
  const [editing, setEditing] = useState(false);
  const [saved, setSaved] = useState(false);
  if (editing) {
    return (
      <Card title={editTitle}>
        {form({
          saved: () => {
            setEditing(false);
            setSaved(true);
          },
          cancel: () => setEditing(false),
        })}
      </Card>
    );
  }
  return (
    <>
      {saved ? (
        <Alert tone="success" className="mb-4">
          {savedMessage}
        </Alert>
      ) : null}
      <Card
        title={title}
        actions={
          canEdit ? (
            <Button
              variant="secondary"
              size="sm"
              onClick={() => {
                setSaved(false);
                setEditing(true);
              }}
            >
              {editLabel}
            </Button>
          ) : null
        }
      >
        {children}
      </Card>
    </>
  );
}
