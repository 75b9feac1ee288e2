// The seed of one point of a sweep, from the sweep seed and the point index alone, so a point
// gets the same replicates whichever worker runs it, however often its chunk is retried, and
// in the command line as on the server.
import { streamFor } from '../random/stream';
import { POINT_SEED_STREAM } from './streams';

const TWO_POW_53 = 9007199254740992;

/**
 * A safe integer in [0, 2^53): the first 53-bit draw of streamFor(sweepSeed, POINT_SEED_STREAM,
 * pointIndex). 53 bits keep accidental equal seeds negligible (about n²/2^54 for n points).
 */
export function pointSeed(sweepSeed: number, pointIndex: number): number {
  if (!Number.isSafeInteger(pointIndex) || pointIndex < 0) {
    throw new RangeError(`point index must be a non-negative safe integer, got ${pointIndex}`);
  }
  return Math.floor(streamFor(sweepSeed, POINT_SEED_STREAM, pointIndex).next() * TWO_POW_53);
}
