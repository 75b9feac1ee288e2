/**
 * Quantile of ascending-sorted data by linear interpolation between order statistics — definition 7 of
 * Hyndman & Fan (1996, Am. Stat. 50:361–365), R's default `quantile(type = 7)`, numpy's "linear":
 *     h = (n − 1)·p,  Q(p) = x[⌊h⌋] + (h − ⌊h⌋)·(x[⌊h⌋ + 1] − x[⌊h⌋])   (0-based x)
 * so Q(0) = min, Q(1) = max, and the median of an even sample is the mean of the middle two.
 * +Infinity entries are allowed (censored "never" values in decline times): interpolating towards
 * one gives +Infinity instead of NaN.
 */
export function quantileSorted(sorted: ArrayLike<number>, probability: number): number {
  const n = sorted.length;
  if (n === 0) throw new RangeError('quantile of an empty sample is undefined');
  if (!(probability >= 0 && probability <= 1)) {
    throw new RangeError(`quantile probability must be in [0, 1], got ${probability}`);
  }
  const h = (n - 1) * probability;
  const lo = Math.floor(h);
  const fraction = h - lo;
  const below = sorted[lo];
  if (fraction === 0) return below;
  const above = sorted[lo + 1];
  return above === below ? below : below + fraction * (above - below);
}
