import type { ReactNode } from 'react';
import { Button } from './Button';

type SaveBarProps = {
  editable: boolean;
  /** Further controls beside the save button (deleting, copying). */
  actions?: ReactNode;
  saving: boolean;
  savedAt: Date | null;
  /** The save button's text: "Save field". */
  label: string;
  /** Extra classes where the bar must reach past its column's padding. */
  className?: string;
};

/**
 * The bar under a long editor, kept in view while scrolling so saving is always one press
 * away. The status line is always rendered so screen readers announce "Saved at …".
 */
export function SaveBar({ editable, actions, saving, savedAt, label, className }: SaveBarProps) {
  if (!editable && !actions) return null;
  return (
    <div
      className={`sticky bottom-0 z-10 flex flex-wrap items-center gap-4 border-t border-silt-300 bg-silt-50 shadow-[0_-6px_12px_-10px_rgb(36_26_19_/_0.35)] py-3 print:hidden${className ? ` ${className}` : ''}`}
    >
      {editable ? (
        <Button type="submit" pending={saving} pendingLabel="Saving…">
          {label}
        </Button>
      ) : null}
      {actions}
      <p role="status" className="text-sm font-medium">
        {savedAt ? (
          <>
            <span aria-hidden="true">✓ </span>Saved at {savedAt.toLocaleTimeString()}.
          </>
        ) : null}
      </p>
    </div>
  );
}
