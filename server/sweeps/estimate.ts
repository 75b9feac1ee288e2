// How long a sweep will take, shown before launch: its replicate-years over the engine's
// measured speed times the worker threads. `npm run bench` (tests/bench/sweep.ts) measured the
// standard sweep at 126,000–234,000 replicate-years per second on one worker thread of this
// 2-core machine (busy with other work at the time); a scenario whose populations stay large
// runs slower (the projection bench's demo perennial: about 50,000 per second), so the rate
// is rounded down to 100,000. It is a guide: the page says "about".
export const REPLICATE_YEARS_PER_SECOND_PER_THREAD = 100_000;

export function estimatedSeconds(replicateYears: number, threads: number): number {
  return Math.ceil(replicateYears / (REPLICATE_YEARS_PER_SECOND_PER_THREAD * Math.max(1, threads)));
}
