// How a sweep's points are cut into chunks: at most about `targetReplicateYears` of work each
// (a second or two of one thread), so a lost chunk costs little to redo; and at least
// MIN_CHUNKS chunks when there are enough points, so progress moves often and extra workers
// have something to take even on a small sweep. Claims stay rare enough that the database is
// never the bottleneck.

/** Upper bound whatever the work per point, so one chunk's results stay one modest insert. */
const MAX_POINTS_PER_CHUNK = 500;
const MIN_CHUNKS = 20;

/** [firstPoint, endPoint) of each chunk, in order. */
export function chunkRanges(
  totalPoints: number,
  replicateYearsPerPoint: number,
  targetReplicateYears: number,
): [number, number][] {
  const byWork = Math.floor(targetReplicateYears / Math.max(1, replicateYearsPerPoint));
  const size = Math.max(1, Math.min(MAX_POINTS_PER_CHUNK, byWork, Math.ceil(totalPoints / MIN_CHUNKS)));
  const out: [number, number][] = [];
  for (let first = 0; first < totalPoints; first += size)
    out.push([first, Math.min(totalPoints, first + size)]);
  return out;
}
