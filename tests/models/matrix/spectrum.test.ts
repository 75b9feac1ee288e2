import fc from 'fast-check';
import { describe, expect, it } from 'vitest';
import { eigenvalues, type Complex } from '../../../models/matrix/spectrum';
import { mathjsEigenvalues, type PlainComplex } from './fixtures';

/** Greedy nearest matching of two eigenvalue multisets; returns the worst distance. */
function worstMatchDistance(ours: readonly Complex[], reference: readonly PlainComplex[]): number {
  const unused = reference.slice();
  let worst = 0;
  for (const z of ours) {
    let best = 0;
    for (let k = 1; k < unused.length; k++) {
      if (
        Math.hypot(unused[k].re - z.re, unused[k].im - z.im) <
        Math.hypot(unused[best].re - z.re, unused[best].im - z.im)
      ) {
        best = k;
      }
    }
    worst = Math.max(worst, Math.hypot(unused[best].re - z.re, unused[best].im - z.im));
    unused.splice(best, 1);
  }
  return worst;
}

describe('eigenvalues (balanced Hessenberg QR)', () => {
  it('finds the roots of a companion matrix with known roots', () => {
    // Closed form: the companion matrix of (x−1)(x−2)(x−3)(x−4) = x⁴ − 10x³ + 35x² − 50x + 24
    // has eigenvalues 1, 2, 3, 4.
    const companion = [
      [10, -35, 50, -24],
      [1, 0, 0, 0],
      [0, 1, 0, 0],
      [0, 0, 1, 0],
    ];
    const found = eigenvalues(companion)
      .map((z) => {
        expect(Math.abs(z.im)).toBeLessThan(1e-12);
        return z.re;
      })
      .sort((x, y) => x - y);
    found.forEach((x, k) => expect(x).toBeCloseTo(k + 1, 10));
  });

  it('stays accurate on a badly scaled similarity of that matrix (balancing)', () => {
    // Closed form: D·C·D⁻¹ is similar to C, so its eigenvalues are again 1, 2, 3, 4. Stage scales that
    // differ by 15 orders of magnitude (seed counts vs establishment probabilities) look like this;
    // without balancing the QR step's error grows with ‖D·C·D⁻¹‖ (measured: ~2e-4 here).
    const c = [
      [10, -35, 50, -24],
      [1, 0, 0, 0],
      [0, 1, 0, 0],
      [0, 0, 1, 0],
    ];
    const d = [1e-6, 1e-1, 1e4, 1e9];
    const scaled = c.map((row, i) => row.map((x, j) => (d[i] * x) / d[j]));
    const found = eigenvalues(scaled)
      .map((z) => z.re)
      .sort((x, y) => x - y);
    found.forEach((x, k) => expect(Math.abs(x - (k + 1))).toBeLessThan(1e-10));
  });

  it('finds the p-th roots of a strictly periodic life cycle (needs the exceptional shifts)', () => {
    // Closed form: a 4-stage cycle with fecundity f and survivals s1..s3 has characteristic polynomial
    // λ⁴ − f·s1·s2·s3, so its eigenvalues are r·{1, i, −1, −i} with r = (f·s1·s2·s3)^(1/4).
    // The plain cyclic permutation is the textbook case where the standard Francis shift stalls.
    for (const [f, s1, s2, s3] of [
      [1, 1, 1, 1],
      [40, 0.3, 0.5, 0.2],
    ]) {
      const a = [
        [0, 0, 0, f],
        [s1, 0, 0, 0],
        [0, s2, 0, 0],
        [0, 0, s3, 0],
      ];
      const r = (f * s1 * s2 * s3) ** 0.25;
      const expected: PlainComplex[] = [
        { re: r, im: 0 },
        { re: 0, im: r },
        { re: -r, im: 0 },
        { re: 0, im: -r },
      ];
      expect(worstMatchDistance(eigenvalues(a), expected)).toBeLessThan(1e-12 * (1 + r));
    }
  });

  it('returns the complex pair e^{±iθ} of a rotation', () => {
    // Closed form: the rotation by θ has eigenvalues cos θ ± i sin θ.
    const theta = 0.7;
    const z = eigenvalues([
      [Math.cos(theta), -Math.sin(theta)],
      [Math.sin(theta), Math.cos(theta)],
    ]);
    expect(z.map((x) => x.re)).toEqual([
      expect.closeTo(Math.cos(theta), 14),
      expect.closeTo(Math.cos(theta), 14),
    ]);
    expect(z.map((x) => Math.abs(x.im))).toEqual([
      expect.closeTo(Math.sin(theta), 14),
      expect.closeTo(Math.sin(theta), 14),
    ]);
    expect(z[0].im).toBeCloseTo(-z[1].im, 14);
  });

  it('matches the 2×2 quadratic formula', () => {
    // Closed form: λ = (tr ± √(tr² − 4 det)) / 2.
    fc.assert(
      fc.property(
        fc.array(fc.double({ min: -50, max: 50, noNaN: true }), { minLength: 4, maxLength: 4 }),
        ([a, b, c, d]) => {
          const tr = a + d;
          const disc = tr * tr - 4 * (a * d - b * c);
          const expected: PlainComplex[] =
            disc >= 0
              ? [
                  { re: (tr + Math.sqrt(disc)) / 2, im: 0 },
                  { re: (tr - Math.sqrt(disc)) / 2, im: 0 },
                ]
              : [
                  { re: tr / 2, im: Math.sqrt(-disc) / 2 },
                  { re: tr / 2, im: -Math.sqrt(-disc) / 2 },
                ];
          const scale = 1 + Math.abs(a) + Math.abs(b) + Math.abs(c) + Math.abs(d);
          // √ of a near-zero discriminant amplifies rounding to ~√ε·scale.
          expect(
            worstMatchDistance(
              eigenvalues([
                [a, b],
                [c, d],
              ]),
              expected,
            ),
          ).toBeLessThanOrEqual(1e-7 * scale);
        },
      ),
      { seed: 7, numRuns: 300 },
    );
  });

  it('resolves a badly scaled pair hidden among zeros', () => {
    // A 9×9 case fast-check found where mathjs 15.2 eigs returns ~2e-13 for a pair that is ±0.0021.
    // Closed form: the only loop in its graph is 7 ↔ 8, so det(λI − A) = λ⁷(λ² − a78·a87) and the
    // eigenvalues are ±√(a78·a87) and seven zeros.
    const a = Array.from({ length: 9 }, () => new Array<number>(9).fill(0));
    a[6][5] = 0.07248446301464294;
    a[7][1] = -5.725389921197738e-68;
    a[7][5] = -2.3350614407284858e-9;
    a[7][6] = 3.221464771363167e-23;
    a[7][8] = 4.4231066790045314e-8;
    a[8][4] = -5.829251774505514e-61;
    a[8][7] = 99.99999999999977;
    const root = Math.sqrt(a[7][8] * a[8][7]);
    const found = eigenvalues(a);
    found.forEach((z) => expect(z.im).toBe(0));
    const sorted = found.map((z) => z.re).sort((x, y) => x - y);
    expect(sorted[0]).toBeCloseTo(-root, 15);
    expect(sorted[8]).toBeCloseTo(root, 15);
    sorted.slice(1, 8).forEach((x) => expect(x).toBeCloseTo(0, 15));
  });

  it('matches mathjs eigs on random dense real matrices up to 10×10', () => {
    // Dense entries from a uniform grid in [−100, 100]: generic matrices with well-conditioned
    // eigenvalues, where mathjs is a fair reference (on sparse, badly scaled ones it is not; see above).
    const entry = fc.integer({ min: 0, max: 1_000_000 }).map((k) => (k - 500_000) / 5_000);
    const realMatrix = fc
      .integer({ min: 1, max: 10 })
      .chain((n) =>
        fc.array(fc.array(entry, { minLength: n, maxLength: n }), { minLength: n, maxLength: n }),
      );
    fc.assert(
      fc.property(realMatrix, (a) => {
        const reference = mathjsEigenvalues(a);
        fc.pre(reference !== null); // mathjs occasionally fails to converge (see fixtures)
        const ours = eigenvalues(a);
        expect(ours).toHaveLength(a.length);
        const scale = 1 + Math.max(...a.flat().map(Math.abs));
        expect(worstMatchDistance(ours, reference as PlainComplex[])).toBeLessThanOrEqual(1e-6 * scale);
      }),
      { seed: 11, numRuns: 200 },
    );
  });

  it('leaves its input untouched', () => {
    const a = [
      [0, 2],
      [0.5, 0.3],
    ];
    const copy = a.map((row) => row.slice());
    eigenvalues(a);
    expect(a).toEqual(copy);
  });
});
