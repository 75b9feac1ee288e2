// Ranks for rank correlations, ties sharing the mean of the ranks they span ("midranks"), so a
// rank correlation depends only on the pairs, not on the order they are listed in
// (Kendall & Gibbons, Rank Correlation Methods, on tied ranks).

/** Ranks 1..n in input order; tied values all get the mean of their positions. */
export function midranks(values: readonly number[]): number[] {
  const order = values.map((_, i) => i).sort((a, b) => values[a] - values[b]);
  const ranks = new Array<number>(values.length);
  let start = 0;
  while (start < order.length) {
    let end = start;
    while (end + 1 < order.length && values[order[end + 1]] === values[order[start]]) end++;
    // Positions start..end (0-based) are ranks start + 1 .. end + 1; their mean:
    const rank = (start + end) / 2 + 1;
    for (let i = start; i <= end; i++) ranks[order[i]] = rank;
    start = end + 1;
  }
  return ranks;
}
