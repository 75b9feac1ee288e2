import { Link } from 'react-router-dom';
import { HorizonRule } from '../shared/components/HorizonRule';
import { NotFoundNotice } from '../shared/components/NotFoundNotice';
import { Wordmark } from '../shared/components/Wordmark';

/** For addresses outside every route; it needs no session, so it carries its own slim header. */
export function NotFoundPage() {
  return (
    <div className="min-h-dvh">
      <title>Not found · Seedwake</title>
      <header className="bg-silt-100 print:hidden">
        <div className="mx-auto max-w-page px-4 py-3 sm:px-6">
          <Link to="/" className="inline-block rounded-seed" aria-label="Seedwake, home">
            <Wordmark />
          </Link>
        </div>
        <HorizonRule />
      </header>
      <main id="main" className="mx-auto max-w-page px-4 sm:px-6">
        <NotFoundNotice />
      </main>
    </div>
  );
}
