/**
 * LU factorisation with partial pivoting (PA = LU) and the matching solve, used for inverse iteration.
 * The matrix being factored there is deliberately close to singular (μI − A with μ ≈ λ1); that is
 * what makes inverse iteration converge fast, and partial pivoting keeps the solve backward stable.
 */
export interface LuFactors {
  /** Combined L (unit lower, below the diagonal) and U (on and above). */
  readonly lu: Float64Array[];
  readonly pivots: Int32Array;
}

export function luFactor(matrix: readonly Float64Array[]): LuFactors {
  const n = matrix.length;
  const lu = matrix.map((row) => Float64Array.from(row));
  const pivots = new Int32Array(n);
  for (let k = 0; k < n; k++) {
    let p = k;
    for (let i = k + 1; i < n; i++) if (Math.abs(lu[i][k]) > Math.abs(lu[p][k])) p = i;
    pivots[k] = p;
    if (p !== k) {
      const t = lu[p];
      lu[p] = lu[k];
      lu[k] = t;
    }
    const pivot = lu[k][k];
    for (let i = k + 1; i < n; i++) {
      const f = (lu[i][k] /= pivot);
      if (f !== 0) for (let j = k + 1; j < n; j++) lu[i][j] -= f * lu[k][j];
    }
  }
  return { lu, pivots };
}

export function luSolve({ lu, pivots }: LuFactors, rhs: Float64Array): Float64Array {
  const n = lu.length;
  const x = Float64Array.from(rhs);
  for (let k = 0; k < n; k++) {
    const p = pivots[k];
    if (p !== k) {
      const t = x[p];
      x[p] = x[k];
      x[k] = t;
    }
  }
  for (let i = 1; i < n; i++) {
    let s = x[i];
    for (let j = 0; j < i; j++) s -= lu[i][j] * x[j];
    x[i] = s;
  }
  for (let i = n - 1; i >= 0; i--) {
    let s = x[i];
    for (let j = i + 1; j < n; j++) s -= lu[i][j] * x[j];
    x[i] = s / lu[i][i];
  }
  return x;
}
