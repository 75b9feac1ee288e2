import { useState } from 'react';
import { Button } from './Button';

type ConfirmDeleteProps = {
  /** What is deleted, as said in the labels: "field", "profile". */
  what: string;
  /** Its name, repeated on the confirming button so nobody deletes the wrong one. */
  name: string;
  pending: boolean;
  error: Error | null;
  onConfirm: () => void;
};

/** Deleting takes two presses: the first only asks, the second names what goes. */
export function ConfirmDelete({ what, name, pending, error, onConfirm }: ConfirmDeleteProps) {
  const [confirming, setConfirming] = useState(false);
  if (!confirming)
    return (
      <Button variant="quiet" size="sm" onClick={() => setConfirming(true)}>
        Delete {what}
      </Button>
    );
  return (
    <span
      role="group"
      aria-label={`Confirm deleting the ${what}`}
      className="flex flex-wrap items-center gap-2"
    >
      <Button variant="danger" size="sm" pending={pending} pendingLabel="Deleting…" onClick={onConfirm}>
        Delete “{name}”
      </Button>
      <Button variant="quiet" size="sm" onClick={() => setConfirming(false)}>
        Keep it
      </Button>
      {error ? (
        <span role="alert" className="text-sm font-medium text-danger-700">
          {error.message}
        </span>
      ) : null}
    </span>
  );
}
