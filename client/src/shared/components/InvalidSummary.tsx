/**
 * Said once at the top of a form when a save was refused on the client: how many values
 * need a look. Each message itself sits beside its field, where focus is moved.
 */
export function InvalidSummary({ show, count, what }: { show: boolean; count: number; what: string }) {
  if (!show || count === 0) return null;
  return (
    <div
      role="alert"
      className="rounded-seed border-l-4 border-danger-700 bg-danger-50 px-4 py-3 text-sm text-danger-700"
    >
      <p className="font-medium">
        {count === 1 ? 'One value needs' : `${count} values need`} a look before {what} can be saved; each is
        marked beside its field, and nothing you typed was lost.
      </p>
    </div>
  );
}
