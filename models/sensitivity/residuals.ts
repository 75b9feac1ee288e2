// Least-squares residuals of vectors on a set of regressors, by projecting out an orthonormal
// basis of the regressors built with modified Gram–Schmidt, each vector orthogonalised twice
// ("twice is enough": Giraud, Langou & Rozložník 2005, Comput. Math. Appl. 50:1069–1075), which
// keeps the basis orthogonal to working precision even for nearly collinear regressors.

// A regressor whose remainder after projection is below this fraction of its length adds
// nothing new (it is, to rounding, a combination of the earlier ones) and is dropped.
const DEPENDENT = 1e-10;

function dot(a: Float64Array, b: Float64Array): number {
  let s = 0;
  for (let i = 0; i < a.length; i++) s += a[i] * b[i];
  return s;
}

function projectOut(v: Float64Array, basis: readonly Float64Array[]): void {
  for (let pass = 0; pass < 2; pass++) {
    for (const q of basis) {
      const c = dot(v, q);
      for (let i = 0; i < v.length; i++) v[i] -= c * q[i];
    }
  }
}

/** Orthonormal basis of the span of the columns (each of length n). */
export function orthonormalBasis(columns: readonly (readonly number[])[]): Float64Array[] {
  const basis: Float64Array[] = [];
  for (const column of columns) {
    const v = Float64Array.from(column);
    const length = Math.sqrt(dot(v, v));
    if (length === 0) continue;
    projectOut(v, basis);
    const remainder = Math.sqrt(dot(v, v));
    if (remainder <= DEPENDENT * length) continue;
    for (let i = 0; i < v.length; i++) v[i] /= remainder;
    basis.push(v);
  }
  return basis;
}

/** y minus its least-squares fit on the basis: the part of y the regressors cannot explain. */
export function residualsOn(basis: readonly Float64Array[], y: readonly number[]): number[] {
  const v = Float64Array.from(y);
  projectOut(v, basis);
  return Array.from(v);
}
