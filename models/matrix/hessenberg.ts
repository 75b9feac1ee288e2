/**
 * Preparation of a real square matrix for the QR eigenvalue iteration: balancing, then reduction to
 * upper Hessenberg form. Both are similarity transforms, so the eigenvalues are unchanged.
 * Algorithms: Parlett & Reinsch (1969) balancing and stabilised elementary (Gauss) reduction, in the
 * form given by Press et al., Numerical Recipes, 2nd ed., §11.5 (balanc, elmhes).
 * Both routines work in place on rows of a Float64Array copy owned by the caller.
 */

const RADIX = 2;

/**
 * Rescales rows and columns by powers of 2 (exact in binary floating point) until each row and its
 * column have similar norms. Projection matrices mix fecundities in the hundreds with survival
 * probabilities near 0.01; without balancing the rounding error of QR scales with the largest entry
 * and swamps the small eigenvalues.
 */
export function balanceInPlace(a: Float64Array[]): void {
  const n = a.length;
  const radixSquared = RADIX * RADIX;
  let done = false;
  while (!done) {
    done = true;
    for (let i = 0; i < n; i++) {
      let rowNorm = 0;
      let colNorm = 0;
      for (let j = 0; j < n; j++) {
        if (j !== i) {
          colNorm += Math.abs(a[j][i]);
          rowNorm += Math.abs(a[i][j]);
        }
      }
      if (colNorm === 0 || rowNorm === 0) continue;
      const total = colNorm + rowNorm;
      let f = 1;
      let c = colNorm;
      let g = rowNorm / RADIX;
      while (c < g) {
        f *= RADIX;
        c *= radixSquared;
      }
      g = rowNorm * RADIX;
      while (c > g) {
        f /= RADIX;
        c /= radixSquared;
      }
      // Only rescale when it reduces the combined norm noticeably, so the loop terminates.
      if ((c + rowNorm) / f < 0.95 * total) {
        done = false;
        const inv = 1 / f;
        for (let j = 0; j < n; j++) a[i][j] *= inv;
        for (let j = 0; j < n; j++) a[j][i] *= f;
      }
    }
  }
}

/**
 * Reduces to upper Hessenberg form by Gaussian elimination with partial pivoting (each elimination is
 * applied as a similarity: row operation on the left, inverse column operation on the right).
 * Entries below the first subdiagonal are set to exactly 0 so the QR step can rely on them.
 */
export function reduceToHessenbergInPlace(a: Float64Array[]): void {
  const n = a.length;
  for (let m = 1; m < n - 1; m++) {
    let pivot = 0;
    let pivotRow = m;
    for (let j = m; j < n; j++) {
      if (Math.abs(a[j][m - 1]) > Math.abs(pivot)) {
        pivot = a[j][m - 1];
        pivotRow = j;
      }
    }
    if (pivotRow !== m) {
      for (let j = m - 1; j < n; j++) {
        const t = a[pivotRow][j];
        a[pivotRow][j] = a[m][j];
        a[m][j] = t;
      }
      for (let j = 0; j < n; j++) {
        const t = a[j][pivotRow];
        a[j][pivotRow] = a[j][m];
        a[j][m] = t;
      }
    }
    if (pivot !== 0) {
      for (let i = m + 1; i < n; i++) {
        const y = a[i][m - 1] / pivot;
        if (y !== 0) {
          a[i][m - 1] = 0;
          for (let j = m; j < n; j++) a[i][j] -= y * a[m][j];
          for (let j = 0; j < n; j++) a[j][m] += y * a[j][i];
        }
      }
    }
  }
}
