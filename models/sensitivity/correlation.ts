// Pearson's product-moment correlation, the last step of both Spearman's rho (on ranks) and the
// partial rank correlation (on residuals of ranks).

/** Pearson correlation of two equal-length samples; NaN when either has no spread (undefined). */
export function pearson(x: readonly number[], y: readonly number[]): number {
  const n = x.length;
  if (y.length !== n) throw new RangeError(`correlation needs equal lengths, got ${n} and ${y.length}`);
  let mx = 0;
  let my = 0;
  for (let i = 0; i < n; i++) {
    mx += x[i];
    my += y[i];
  }
  mx /= n;
  my /= n;
  // Centred sums in a second pass: the one-pass formula loses digits when means dwarf spreads.
  let sxy = 0;
  let sxx = 0;
  let syy = 0;
  for (let i = 0; i < n; i++) {
    const dx = x[i] - mx;
    const dy = y[i] - my;
    sxy += dx * dy;
    sxx += dx * dx;
    syy += dy * dy;
  }
  if (sxx === 0 || syy === 0) return NaN;
  // Clamp rounding just past ±1, which would make the t statistic of a p-value imaginary.
  return Math.max(-1, Math.min(1, sxy / Math.sqrt(sxx * syy)));
}
