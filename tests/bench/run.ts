// Runs every benchmark and prints each result as one JSON line (`npm run bench`).
// To add a benchmark, append its function to BENCHES.
import { benchSamplers } from './sampler';
import { benchProjections } from './projection';
import { benchSweeps } from './sweep';

const BENCHES: Array<() => Promise<object[]>> = [benchSamplers, benchProjections, benchSweeps];

for (const bench of BENCHES) {
  for (const line of await bench()) console.log(JSON.stringify(line));
}
