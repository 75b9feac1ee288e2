import { Button } from './Button';

type SubmitRowProps = {
  label: string;
  pending: boolean;
  pendingLabel: string;
  /** The confirmation shown beside the button once the form went through, or null. */
  done: string | null;
};

/** A short form's submit button with its "✓ done" note beside it. */
export function SubmitRow({ label, pending, pendingLabel, done }: SubmitRowProps) {
  return (
    <div className="flex flex-wrap items-center gap-4">
      <Button type="submit" pending={pending} pendingLabel={pendingLabel}>
        {label}
      </Button>
      {done ? (
        <p role="status" className="text-sm font-medium">
          <span aria-hidden="true">✓ </span>
          {done}
        </p>
      ) : null}
    </div>
  );
}
