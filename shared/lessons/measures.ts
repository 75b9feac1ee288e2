// The numbers a lesson states, read off the engine's yearly series so that the page says
// what its chart draws (the tests hold them against the closed forms).

/**
 * The first time a declining series reaches `fraction` of its first value, interpolated
 * on the log scale between the census years around it (exact for geometric decline, as a
 * seed cohort's is); null when it stays above that level over the whole series.
 */
export function yearsToFraction(series: ArrayLike<number>, fraction: number): number | null {
  const target = series[0] * fraction;
  for (let t = 1; t < series.length; t++) {
    if (series[t] <= target) {
      const before = series[t - 1];
      const after = series[t];
      if (after <= 0 || before <= 0 || before === after) return t;
      return t - 1 + Math.log(target / before) / Math.log(after / before);
    }
  }
  return null;
}

/**
 * One year of seed set: the seedbank at the census before `seedYear` is where it was;
 * the answer is how many years after that year's seed rain it takes to get back to it
 * (0 when the seeding added nothing), or null if it does not within the series.
 */
export function yearsBackToLevel(series: ArrayLike<number>, seedYear: number): number | null {
  const level = series[seedYear - 1];
  for (let t = seedYear; t < series.length; t++) if (series[t] <= level * (1 + 1e-12)) return t - seedYear;
  return null;
}
