import { Link } from 'react-router-dom';
import { buttonClasses } from './Button';

/** Said the same way whether the address is unknown or names something this person may not see. */
export function NotFoundNotice({ what = 'page' }: { what?: string }) {
  return (
    <section
      aria-labelledby="not-found-title"
      className="mx-auto flex max-w-xl flex-col items-start gap-4 py-12"
    >
      <p className="font-mono text-sm tracking-wide text-russet-700">404 · nothing at this depth</p>
      <h1 id="not-found-title" className="text-4xl font-semibold">
        No such {what}
      </h1>
      <p className="text-lg text-loam-700">
        The address may be mistyped, or the {what} may have been removed or never shared with you.
      </p>
      <Link to="/" className={buttonClasses('primary')}>
        Go to your workspace
      </Link>
    </section>
  );
}
