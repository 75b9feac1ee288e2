import type { ReactNode } from 'react';
import { Strata } from '../../shared/components/Strata';
import { Wordmark } from '../../shared/components/Wordmark';

/** The frame of the signed-out pages: a soil profile beside the form, or above it on a phone. */
export function AuthFrame({ children }: { children: ReactNode }) {
  return (
    <div className="grid min-h-dvh lg:grid-cols-[minmax(0,5fr)_minmax(0,7fr)]">
      <aside className="on-humus relative flex flex-col overflow-hidden bg-humus-900 text-silt-100 print:hidden">
        <div className="relative z-10 flex flex-col gap-5 px-6 pt-6 pb-28 sm:px-10 lg:px-12 lg:pt-12 lg:pb-10">
          <Wordmark tone="light" />
          <p className="max-w-md font-display text-2xl leading-tight font-medium text-silt-50 sm:text-3xl lg:mt-8 lg:text-[2.75rem]">
            See a decade of seedbank before you plan a season.
          </p>
          <p className="hidden max-w-md text-lg text-silt-200 lg:block">
            Year-by-year projections of a weed’s soil seedbank and plant stand under each management strategy,
            with the uncertainty drawn, not hidden.
          </p>
        </div>
        <Strata variant="band" className="absolute inset-x-0 bottom-0 h-28 w-full lg:hidden" />
        {/* On wide screens the profile fills whatever height the words leave below them. */}
        <div className="relative hidden min-h-64 flex-1 lg:block">
          <Strata variant="panel" className="absolute inset-0 h-full w-full" />
        </div>
      </aside>
      <main id="main" className="flex justify-center px-5 py-10 sm:px-10 lg:items-center lg:py-16">
        <div className="w-full max-w-md">{children}</div>
      </main>
    </div>
  );
}
