/**
 * All eigenvalues of a real upper Hessenberg matrix by the Francis double-shift QR iteration with
 * exceptional shifts, following Press et al., Numerical Recipes, 2nd ed., §11.6 (hqr), itself after
 * the EISPACK routine HQR (Wilkinson & Reinsch 1971). Translated to 0-based indices.
 * Double shifts keep the arithmetic real while converging to complex-conjugate pairs, which
 * projection matrices have in abundance (damped oscillations of the stage structure).
 */

/** Iterations allowed per eigenvalue before giving up; exceptional shifts are applied at 10 and 20. */
const MAX_ITERATIONS_PER_EIGENVALUE = 30;

export interface EigenvalueParts {
  readonly re: Float64Array;
  readonly im: Float64Array;
}

/** Destroys `a` (an upper Hessenberg matrix, rows as Float64Array). */
export function hessenbergEigenvaluesInPlace(a: Float64Array[]): EigenvalueParts {
  const n = a.length;
  const wr = new Float64Array(n);
  const wi = new Float64Array(n);
  let anorm = 0;
  for (let i = 0; i < n; i++) {
    for (let j = Math.max(i - 1, 0); j < n; j++) anorm += Math.abs(a[i][j]);
  }
  let nn = n - 1;
  let t = 0; // accumulated exceptional shift
  while (nn >= 0) {
    let its = 0;
    let l: number;
    do {
      // Look for a single small subdiagonal element to split the matrix.
      for (l = nn; l >= 1; l--) {
        let s = Math.abs(a[l - 1][l - 1]) + Math.abs(a[l][l]);
        if (s === 0) s = anorm;
        if (Math.abs(a[l][l - 1]) + s === s) {
          a[l][l - 1] = 0;
          break;
        }
      }
      let x = a[nn][nn];
      if (l === nn) {
        // One root found.
        wr[nn] = x + t;
        wi[nn] = 0;
        nn--;
      } else {
        let y = a[nn - 1][nn - 1];
        let w = a[nn][nn - 1] * a[nn - 1][nn];
        if (l === nn - 1) {
          // Two roots found: eigenvalues of the trailing 2×2 block.
          const p = 0.5 * (y - x);
          const q = p * p + w;
          let z = Math.sqrt(Math.abs(q));
          x += t;
          if (q >= 0) {
            z = p + (p >= 0 ? Math.abs(z) : -Math.abs(z));
            wr[nn - 1] = wr[nn] = x + z;
            if (z !== 0) wr[nn] = x - w / z;
            wi[nn - 1] = wi[nn] = 0;
          } else {
            wr[nn - 1] = wr[nn] = x + p;
            wi[nn - 1] = -z;
            wi[nn] = z;
          }
          nn -= 2;
        } else {
          if (its === MAX_ITERATIONS_PER_EIGENVALUE) {
            throw new Error('QR eigenvalue iteration did not converge');
          }
          if (its === 10 || its === 20) {
            // Exceptional shift breaks the rare cycles of the standard shift.
            t += x;
            for (let i = 0; i <= nn; i++) a[i][i] -= x;
            const s = Math.abs(a[nn][nn - 1]) + Math.abs(a[nn - 1][nn - 2]);
            y = x = 0.75 * s;
            w = -0.4375 * s * s;
          }
          ++its;
          // Form the shift and look for two consecutive small subdiagonal elements.
          let m: number;
          let p = 0;
          let q = 0;
          let r = 0;
          let z = 0;
          for (m = nn - 2; m >= l; m--) {
            z = a[m][m];
            r = x - z;
            let s = y - z;
            p = (r * s - w) / a[m + 1][m] + a[m][m + 1];
            q = a[m + 1][m + 1] - z - r - s;
            r = a[m + 2][m + 1];
            s = Math.abs(p) + Math.abs(q) + Math.abs(r);
            p /= s;
            q /= s;
            r /= s;
            if (m === l) break;
            const u = Math.abs(a[m][m - 1]) * (Math.abs(q) + Math.abs(r));
            const v = Math.abs(p) * (Math.abs(a[m - 1][m - 1]) + Math.abs(z) + Math.abs(a[m + 1][m + 1]));
            if (u + v === v) break;
          }
          for (let i = m + 2; i <= nn; i++) {
            a[i][i - 2] = 0;
            if (i !== m + 2) a[i][i - 3] = 0;
          }
          // Double QR step on rows l..nn and columns m..nn.
          for (let k = m; k <= nn - 1; k++) {
            if (k !== m) {
              p = a[k][k - 1];
              q = a[k + 1][k - 1];
              r = 0;
              if (k !== nn - 1) r = a[k + 2][k - 1];
              x = Math.abs(p) + Math.abs(q) + Math.abs(r);
              if (x !== 0) {
                p /= x;
                q /= x;
                r /= x;
              }
            }
            const norm = Math.sqrt(p * p + q * q + r * r);
            const s = p >= 0 ? norm : -norm;
            if (s !== 0) {
              if (k === m) {
                if (l !== m) a[k][k - 1] = -a[k][k - 1];
              } else {
                a[k][k - 1] = -s * x;
              }
              p += s;
              x = p / s;
              y = q / s;
              z = r / s;
              q /= p;
              r /= p;
              for (let j = k; j <= nn; j++) {
                p = a[k][j] + q * a[k + 1][j];
                if (k !== nn - 1) {
                  p += r * a[k + 2][j];
                  a[k + 2][j] -= p * z;
                }
                a[k + 1][j] -= p * y;
                a[k][j] -= p * x;
              }
              const mmin = nn < k + 3 ? nn : k + 3;
              for (let i = l; i <= mmin; i++) {
                p = x * a[i][k] + y * a[i][k + 1];
                if (k !== nn - 1) {
                  p += z * a[i][k + 2];
                  a[i][k + 2] -= p * r;
                }
                a[i][k + 1] -= p * q;
                a[i][k] -= p;
              }
            }
          }
        }
      }
    } while (l < nn - 1);
  }
  return { re: wr, im: wi };
}
