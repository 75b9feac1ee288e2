// Half-lives of a seedbank layer, read from a yearly census series and from decay alone.

/**
 * Years until a declining series first falls to half its start, interpolated on the log
 * scale between the two census years around it (exact for geometric decline); null when
 * it stays above half over the whole preview.
 */
export function halfLifeYears(values: ArrayLike<number>): number | null {
  const half = values[0] / 2;
  for (let t = 1; t < values.length; t++) {
    if (values[t] <= half) {
      const before = values[t - 1];
      const after = values[t];
      if (after <= 0 || before <= 0) return t;
      return t - 1 + Math.log(half / before) / Math.log(after / before);
    }
  }
  return null;
}

/** Half-life from decay alone: (1 − d)^t = ½, so t = ln 2 / −ln(1 − d). */
export function decayOnlyHalfLife(d: number): number | null {
  if (d <= 0) return null;
  if (d >= 1) return 0;
  return Math.LN2 / -Math.log(1 - d);
}
