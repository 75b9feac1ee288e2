// Throughput of the random stream and of the binomial sampler, side by side with
// numpy's Generator.binomial on the same machine in the same run (the reference
// script lives outside the repository, shared by the team).
import { execFile } from 'node:child_process';
import { promisify } from 'node:util';
import { streamFor } from '../../models/random/stream';
import { Sampler } from '../../models/random/sampler';

const run = promisify(execFile);

const NUMPY_SCRIPT = '/work/shared/bench/reference-binomial.py';
// The standard mix of the reference script: n = floor(10^U(0,7)), p = U(0.01, 0.99).
const MIX_DRAWS = 2_000_000;
const MIX_REPEATS = 5;
const MIX_SEED = 20261201;
const STREAM_DRAWS = 20_000_000;
const STREAM_REPEATS = 5;

/**
 * Best wall-clock seconds of `repeats` runs of `body`, and the sum of what the runs
 * returned. Bodies return their accumulators (rather than updating captured
 * variables, which V8 would box on every iteration) so no loop is optimised away.
 */
function bestOf(repeats: number, body: () => number): { seconds: number; total: number } {
  let seconds = Infinity;
  let total = 0;
  for (let i = 0; i < repeats; i++) {
    const start = performance.now();
    total += body();
    seconds = Math.min(seconds, (performance.now() - start) / 1000);
  }
  return { seconds, total };
}

function benchBinomialMix(): { bestSeconds: number; drawsPerSecond: number; meanOverExpected: number } {
  const setup = streamFor(MIX_SEED, 0);
  const ns = new Float64Array(MIX_DRAWS);
  const ps = new Float64Array(MIX_DRAWS);
  for (let i = 0; i < MIX_DRAWS; i++) ns[i] = Math.floor(10 ** (7 * setup.next()));
  for (let i = 0; i < MIX_DRAWS; i++) ps[i] = 0.01 + 0.98 * setup.next();
  const sampler = new Sampler(streamFor(MIX_SEED, 1));
  const last = new Float64Array(MIX_DRAWS);
  const { seconds } = bestOf(MIX_REPEATS, () => {
    for (let i = 0; i < MIX_DRAWS; i++) last[i] = sampler.binomial(ns[i], ps[i]);
    return 0;
  });
  // Same sanity figure as the reference script: mean of x / (n·p) over the last run.
  let ratioSum = 0;
  for (let i = 0; i < MIX_DRAWS; i++) ratioSum += last[i] / (ns[i] * ps[i]);
  return {
    bestSeconds: seconds,
    drawsPerSecond: Math.round(MIX_DRAWS / seconds),
    meanOverExpected: Number((ratioSum / MIX_DRAWS).toFixed(4)),
  };
}

type NumpyResult =
  { available: true; drawsPerSecond: number; version: string } | { available: false; reason: string };

async function benchNumpy(): Promise<NumpyResult> {
  // The machine-tuning variables of the shell must not reach numpy's BLAS here.
  const env = { ...process.env };
  delete env.OPENBLAS_CORETYPE;
  delete env.OPENBLAS_L2_SIZE;
  try {
    const { stdout } = await run('python3', [NUMPY_SCRIPT], { env, timeout: 300_000 });
    const line = JSON.parse(stdout.trim().split('\n').pop() ?? '{}') as {
      drawsPerSecond?: number;
      numpy?: string;
    };
    if (typeof line.drawsPerSecond !== 'number')
      return { available: false, reason: 'no drawsPerSecond in output' };
    return { available: true, drawsPerSecond: line.drawsPerSecond, version: String(line.numpy) };
  } catch (error) {
    // python3 missing, numpy missing or the script failing all mean "no reference".
    const reason = error instanceof Error ? error.message.split('\n')[0] : String(error);
    return { available: false, reason };
  }
}

function benchStream(): object[] {
  const source = streamFor(MIX_SEED, 2);
  // The means are reported (both should be near 0.5) as a sanity check.
  const doubles = bestOf(STREAM_REPEATS, () => {
    let sum = 0;
    for (let i = 0; i < STREAM_DRAWS; i++) sum += source.next();
    return sum;
  });
  const uints = bestOf(STREAM_REPEATS, () => {
    let sum = 0;
    for (let i = 0; i < STREAM_DRAWS; i++) sum += source.nextUint32();
    return sum;
  });
  const count = STREAM_REPEATS * STREAM_DRAWS;
  return [
    {
      bench: 'stream-next',
      what: 'UniformSource.next(), 53-bit uniforms on [0, 1)',
      draws: STREAM_DRAWS,
      bestSeconds: Number(doubles.seconds.toFixed(4)),
      uniformsPerSecond: Math.round(STREAM_DRAWS / doubles.seconds),
      mean: Number((doubles.total / count).toFixed(4)),
    },
    {
      bench: 'stream-nextUint32',
      what: 'UniformSource.nextUint32(), integers in [0, 2^32)',
      draws: STREAM_DRAWS,
      bestSeconds: Number(uints.seconds.toFixed(4)),
      uniformsPerSecond: Math.round(STREAM_DRAWS / uints.seconds),
      meanOver2to32: Number((uints.total / count / 2 ** 32).toFixed(4)),
    },
  ];
}

/** JSON-able result lines: the binomial mix against numpy, then the raw stream floor. */
export async function benchSamplers(): Promise<object[]> {
  const ours = benchBinomialMix();
  // Run after ours, never alongside: the machine has two cores shared with others.
  const numpy = await benchNumpy();
  const binomialLine = {
    bench: 'binomial-mix',
    what: `Sampler.binomial, n = floor(10^U(0,7)), p = U(0.01,0.99), best of ${MIX_REPEATS}`,
    draws: MIX_DRAWS,
    bestSeconds: Number(ours.bestSeconds.toFixed(4)),
    drawsPerSecond: ours.drawsPerSecond,
    meanOverExpected: ours.meanOverExpected,
    numpyDrawsPerSecond: numpy.available ? numpy.drawsPerSecond : null,
    numpyVersion: numpy.available ? numpy.version : null,
    numpy: numpy.available ? 'available' : `unavailable: ${numpy.reason}`,
    ratioToNumpy: numpy.available ? Number((ours.drawsPerSecond / numpy.drawsPerSecond).toFixed(3)) : null,
  };
  return [binomialLine, ...benchStream()];
}
