import { describe, expect, it } from 'vitest';
import { analyzeMatrix } from '../../../models/matrix/analysis';

describe('analyzeMatrix closed forms', () => {
  it('1×1: λ = a, everything else trivial, no second eigenvalue', () => {
    const r = analyzeMatrix([[2.5]]);
    expect(r.lambda).toBeCloseTo(2.5, 14);
    expect(r.stableStage).toEqual([1]);
    expect(r.reproductiveValue).toEqual([1]);
    expect(r.sensitivities[0][0]).toBeCloseTo(1, 14);
    expect(r.elasticities[0][0]).toBeCloseTo(1, 14);
    expect(r.dampingRatio).toBe(Infinity);
  });

  it('imprimitive 2-cycle (an annual without carry-over): λ = √(fs), elasticities ½, ρ = 1', () => {
    // Closed form for A = [[0, f], [s, 0]]: eigenvalues ±√(fs); w ∝ (f, λ); v ∝ (s, λ); both entries
    // lie on the only loop, so each has elasticity 1/2 (Caswell 2001 §9.2: loop elasticities are equal).
    // Plain power iteration oscillates forever on this matrix.
    const f = 6;
    const s = 0.3;
    const r = analyzeMatrix([
      [0, f],
      [s, 0],
    ]);
    const lambda = Math.sqrt(f * s);
    expect(r.lambda).toBeCloseTo(lambda, 13);
    expect(r.stableStage[0]).toBeCloseTo(f / (f + lambda), 13);
    expect(r.reproductiveValue[1]).toBeCloseTo(lambda / s, 12);
    expect(r.elasticities[0][1]).toBeCloseTo(0.5, 13);
    expect(r.elasticities[1][0]).toBeCloseTo(0.5, 13);
    expect(r.dampingRatio).toBeCloseTo(1, 12);
  });

  it('periodic cycles report damping ratio 1, never below it despite rounding', () => {
    // Perron–Frobenius: |λ_i| ≤ λ1 for a non-negative matrix, with equality for all p-th roots of an
    // imprimitive matrix of period p, so ρ = 1 exactly (QR returns |λ2| a few ulps either side).
    const cycles = [
      [
        [0, 0, 0, 40],
        [0.3, 0, 0, 0],
        [0, 0.5, 0, 0],
        [0, 0, 0.2, 0],
      ],
      [
        [0, 0, 0, 7],
        [0.1, 0, 0, 0],
        [0, 0.9, 0, 0],
        [0, 0, 0.33, 0],
      ],
      [
        [0, 0, 50],
        [0.1, 0, 0],
        [0, 0.03, 0],
      ],
      [
        [0, 2],
        [0.7, 0],
      ],
    ];
    for (const a of cycles) {
      const { dampingRatio } = analyzeMatrix(a);
      expect(dampingRatio).toBeGreaterThanOrEqual(1);
      expect(dampingRatio).toBeCloseTo(1, 12);
    }
  });

  it('Leslie matrix: Euler–Lotka equation, stable age l_x λ^-x, Fisher reproductive value', () => {
    // Caswell 2001 §4.5 (and Fisher 1930): for fertilities F_x and survivals P_x, with l_0 = 1,
    // l_x = P_0···P_{x-1}: Σ F_x l_x λ^-(x+1) = 1, w_x ∝ l_x λ^-x, v_x = λ^(x−1) Σ_{k≥x} F_k l_k λ^-k / l_x.
    const F = [0, 1.2, 3.5, 2.0];
    const P = [0.4, 0.6, 0.5];
    const n = F.length;
    const a = Array.from({ length: n }, (_, i) =>
      Array.from({ length: n }, (_, j) => (i === 0 ? F[j] : i === j + 1 ? P[j] : 0)),
    );
    const { lambda, stableStage: w, reproductiveValue: v } = analyzeMatrix(a);
    const l = [1];
    for (let x = 1; x < n; x++) l.push(l[x - 1] * P[x - 1]);
    expect(F.reduce((t, fx, x) => t + fx * l[x] * lambda ** -(x + 1), 0)).toBeCloseTo(1, 13);
    const raw = l.map((lx, x) => lx * lambda ** -x);
    const total = raw.reduce((t, x) => t + x, 0);
    raw.forEach((x, k) => expect(w[k]).toBeCloseTo(x / total, 13));
    for (let x = 0; x < n; x++) {
      let tail = 0;
      for (let k = x; k < n; k++) tail += F[k] * l[k] * lambda ** -k;
      expect(v[x]).toBeCloseTo((lambda ** (x - 1) * tail) / l[x], 12);
    }
  });

  it('identity (two stages that never mix): λ = 1 with damping ratio 1', () => {
    const r = analyzeMatrix([
      [1, 0],
      [0, 1],
    ]);
    expect(r.lambda).toBeCloseTo(1, 14);
    expect(r.dampingRatio).toBeCloseTo(1, 12);
  });

  it('a zero eigenvalue computed as ~1e-8 still counts as zero for the damping ratio', () => {
    // Closed form: [[1,0,0],[1,0,0],[0,1,0]] has eigenvalues 1, 0, 0 (a 2×2 Jordan block at 0, which
    // QR resolves only to ±√ε ≈ 1e-8).
    const r = analyzeMatrix([
      [1, 0, 0],
      [1, 0, 0],
      [0, 1, 0],
    ]);
    expect(r.lambda).toBeCloseTo(1, 14);
    expect(r.dampingRatio).toBe(Infinity);
    expect(r.reproductiveValue).toEqual([1, expect.closeTo(0, 12), expect.closeTo(0, 12)]);
    expect(r.stableStage).toEqual([
      expect.closeTo(1 / 3, 14),
      expect.closeTo(1 / 3, 14),
      expect.closeTo(1 / 3, 14),
    ]);
  });
});

describe('analyzeMatrix rejects what it cannot analyse', () => {
  it('nilpotent matrix (no life-cycle loop): λ = 0', () => {
    expect(() =>
      analyzeMatrix([
        [0, 0],
        [0.5, 0],
      ]),
    ).toThrow(/no life-cycle loop/);
    expect(() => analyzeMatrix([[0]])).toThrow(RangeError);
  });

  it('defective repeated dominant eigenvalue: λ is not differentiable', () => {
    // Closed form: [[0.5, 0], [1, 0.5]] is a Jordan block, λ = 0.5 twice with one eigenvector (0, 1);
    // the left eigenvector (1, 0) is orthogonal to it, so v_i w_j / ⟨v, w⟩ does not exist.
    expect(() =>
      analyzeMatrix([
        [0.5, 0],
        [1, 0.5],
      ]),
    ).toThrow(/repeated and defective/);
  });

  it('names the problem in the validation message', () => {
    expect(() => analyzeMatrix([])).toThrow(
      new RangeError('projection matrix must have at least one row (at least 1×1)'),
    );
    expect(() => analyzeMatrix([[1, 2], [3]])).toThrow(/square: row 1 has 1 entries but there are 2 rows/);
    expect(() =>
      analyzeMatrix([
        [1, 2, 3],
        [4, 5, 6],
      ]),
    ).toThrow(/square: row 0 has 3 entries/);
    expect(() =>
      analyzeMatrix([
        [1, -0.2],
        [0.3, 0],
      ]),
    ).toThrow(/row 0, column 1 is -0.2; entries must be non-negative/);
    expect(() =>
      analyzeMatrix([
        [1, 0],
        [NaN, 0],
      ]),
    ).toThrow(/row 1, column 0 is NaN; it must be a finite number/);
    expect(() => analyzeMatrix([[Infinity]])).toThrow(/row 0, column 0 is Infinity/);
    expect(() => analyzeMatrix([[1, 0], 'x' as unknown as number[]])).toThrow(/row 1 is not an array/);
    expect(() =>
      analyzeMatrix([
        [1, '2' as unknown as number],
        [0, 1],
      ]),
    ).toThrow(/row 0, column 1 is 2; it must be a finite number/);
  });
});
