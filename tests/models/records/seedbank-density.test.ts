import chisquareCdf from '@stdlib/stats-base-dists-chisquare-cdf';
import chisquareQuantile from '@stdlib/stats-base-dists-chisquare-quantile';
import { lgamma } from 'mathjs';
import { describe, expect, it } from 'vitest';
import { RecordsError } from '../../../models/records/records-error';
import {
  coreAreaM2,
  estimateSeedbankDensity,
  type SoilCoreSample,
} from '../../../models/records/seedbank-density';
import { SQUARE_METRES_PER_SQUARE_FOOT, perSquareMetreToPerSquareFoot } from '../../../models/records/units';
import { tQuantileReference } from './reference';

const cores = (counts: number[], diameterCm = 5, layer = '0–5 cm'): SoilCoreSample[] =>
  counts.map((count) => ({ layer, coreDiameterCm: diameterCm, cores: 1, count }));

/** Full negative-binomial log-likelihood (with every constant) from mathjs' log-gamma. */
function nbLogLik(counts: number[], mean: number, k: number): number {
  return counts.reduce(
    (sum, x) =>
      sum +
      lgamma(x + k) -
      lgamma(k) -
      lgamma(x + 1) +
      k * Math.log(k / (k + mean)) +
      x * Math.log(mean / (k + mean)),
    0,
  );
}

describe('seedbank density from soil cores', () => {
  it('worked conversion: 10 cores of 5 cm, 20 seeds → 1018.6 seeds/m² and 94.63 seeds/ft²', () => {
    // Hand calculation: core area π·(0.025 m)² = 0.0019635 m²; 20 / (10 × 0.0019635) = 1018.59 /m²;
    // × 0.09290304 m²/ft² (NIST SP 811) = 94.630 /ft².
    const [layer] = estimateSeedbankDensity([{ layer: '0–5 cm', coreDiameterCm: 5, cores: 10, count: 20 }]);
    expect(coreAreaM2(5)).toBeCloseTo(Math.PI * 0.025 ** 2, 15);
    expect(layer.areaM2).toBeCloseTo(10 * Math.PI * 0.025 ** 2, 15);
    expect(layer.perM2.estimate.toFixed(1)).toBe('1018.6');
    expect(layer.perFt2.estimate.toFixed(2)).toBe('94.63');
    // One pooled sample cannot show over-dispersion: exact Poisson on the total, Garwood (1936) relation
    // with @stdlib's chi-square quantile, divided by the area sampled.
    expect(layer.method).toBe('exact-poisson');
    expect(layer.reason).toMatch(/one sample/);
    expect(layer.perM2.lower).toBeCloseTo(chisquareQuantile(0.025, 40) / 2 / layer.areaM2, 8);
    expect(layer.perM2.upper).toBeCloseTo(chisquareQuantile(0.975, 42) / 2 / layer.areaM2, 8);
    expect(layer.perFt2.upper).toBeCloseTo(layer.perM2.upper * 0.09290304, 10);
  });

  it('uses the exact factor 1 ft² = 0.09290304 m² (NIST SP 811: 1 ft = 0.3048 m exactly)', () => {
    // 0.3048² = 0.09290304 exactly: 3048² = 9 290 304, checked in integers.
    expect(3048n * 3048n).toBe(9_290_304n);
    expect(SQUARE_METRES_PER_SQUARE_FOOT).toBe(0.09290304);
    expect(perSquareMetreToPerSquareFoot(10_000)).toBeCloseTo(929.0304, 10);
  });

  it('keeps the exact Poisson interval when the per-core counts are not over-dispersed', () => {
    // Index of dispersion (Fisher 1950): X² = Σ(x − x̄)²/x̄ = 4/2 = 2.0 on 9 df; p from @stdlib's CDF.
    const [layer] = estimateSeedbankDensity(cores([2, 1, 3, 2, 2, 1, 3, 2, 2, 2]));
    expect(layer.dispersion?.statistic).toBeCloseTo(2, 12);
    expect(layer.dispersion?.df).toBe(9);
    expect(layer.dispersion?.pValue).toBeCloseTo(1 - chisquareCdf(2, 9), 10);
    expect(layer.dispersion?.varianceToMean).toBeCloseTo(2 / 9, 12);
    expect(layer.method).toBe('exact-poisson');
    expect(layer.reason).toMatch(/no evidence of over-dispersion/);
    expect(layer.perM2.upper).toBeCloseTo(chisquareQuantile(0.975, 42) / 2 / layer.areaM2, 8);
  });

  it('switches to a negative-binomial interval for clumped counts, with the moment k of Bliss & Fisher', () => {
    const counts = [0, 0, 0, 1, 0, 2, 0, 0, 15, 2];
    const [layer] = estimateSeedbankDensity(cores(counts));
    // x̄ = 2, s² = (234 − 10·4)/9 = 21.556: X² = 9·s²/x̄ = 97 on 9 df, far in the upper tail.
    expect(layer.dispersion?.statistic).toBeCloseTo(97, 10);
    expect(layer.dispersion?.pValue).toBeLessThan(0.05);
    expect(layer.method).toBe('negative-binomial');
    expect(layer.reason).toMatch(/over-dispersed/);
    // Bliss & Fisher (1953), Biometrics 9:176–200, moment estimate k = x̄² / (s² − x̄).
    const mean = 2;
    const s2 = 194 / 9;
    const k = (mean * mean) / (s2 - mean);
    expect(layer.k).toBeCloseTo(k, 9);
    // Profile-likelihood limits: with k fixed, the NB MLE of the mean per core is x̄ (closed form for
    // equal areas), and each limit sits where 2·(ℓ(x̄) − ℓ(μ)) = F(0.95; 1, 9) = t(0.975; 9)², the
    // documented small-sample cut (t from formulajs T.INV).
    const area = coreAreaM2(5);
    const cut = tQuantileReference(0.975, 9) ** 2;
    for (const limit of [layer.perM2.lower, layer.perM2.upper]) {
      expect(2 * (nbLogLik(counts, mean, k) - nbLogLik(counts, limit * area, k))).toBeCloseTo(cut, 6);
    }
    expect(layer.perM2.estimate).toBeCloseTo(mean / area, 9);
    // Clumping widens the interval beyond the Poisson one on the same total.
    const poisson = estimateSeedbankDensity([{ layer: 'x', coreDiameterCm: 5, cores: 10, count: 20 }])[0];
    expect(layer.perM2.lower).toBeLessThan(poisson.perM2.lower);
    expect(layer.perM2.upper).toBeGreaterThan(poisson.perM2.upper);
  });

  it('solves the Pearson moment equation for k when pooled samples differ in size', () => {
    // Over-dispersed samples of 1–4 cores: k must satisfy Σ (xᵢ − λ̂aᵢ)² / (λ̂aᵢ(1 + λ̂aᵢ/k)) = n − 1
    // with λ̂ = Σx / Σa (the documented moment equation; Bliss & Fisher 1953 for equal areas).
    const samples = [
      { count: 0, cores: 1 },
      { count: 30, cores: 2 },
      { count: 1, cores: 3 },
      { count: 2, cores: 4 },
      { count: 25, cores: 1 },
      { count: 0, cores: 2 },
    ].map((s) => ({ layer: '0–10 cm', coreDiameterCm: 7, ...s }));
    const [layer] = estimateSeedbankDensity(samples);
    expect(layer.method).toBe('negative-binomial');
    const k = layer.k as number;
    const lambda = 58 / (13 * coreAreaM2(7));
    const pearson = samples.reduce((sum, s) => {
      const mu = lambda * s.cores * coreAreaM2(7);
      return sum + (s.count - mu) ** 2 / (mu * (1 + mu / k));
    }, 0);
    expect(pearson).toBeCloseTo(5, 9);
    expect(layer.perM2.lower).toBeLessThan(layer.perM2.estimate);
    expect(layer.perM2.upper).toBeGreaterThan(layer.perM2.estimate);
  });

  it('tests dispersion of pooled samples of unequal size against their expected shares', () => {
    // Samples of 2, 3 and 5 cores with 10, 14 and 26 seeds: λ̂·aᵢ = 50·(2, 3, 5)/10 = 10, 15, 25, so
    // X² = 0²/10 + 1²/15 + 1²/25 = 0.10667 on 2 df (hand calculation).
    const [layer] = estimateSeedbankDensity([
      { layer: 'A', coreDiameterCm: 4, cores: 2, count: 10 },
      { layer: 'A', coreDiameterCm: 4, cores: 3, count: 14 },
      { layer: 'A', coreDiameterCm: 4, cores: 5, count: 26 },
    ]);
    expect(layer.cores).toBe(10);
    expect(layer.dispersion?.statistic).toBeCloseTo(1 / 15 + 1 / 25, 12);
    expect(layer.perM2.estimate).toBeCloseTo(50 / (10 * Math.PI * 0.02 ** 2), 8);
  });

  it('groups by layer in order of appearance and handles a layer with no seeds', () => {
    const result = estimateSeedbankDensity([
      ...cores([3, 4, 2], 5, '0–5 cm'),
      ...cores([0, 0, 0], 5, '5–15 cm'),
    ]);
    expect(result.map((r) => r.layer)).toEqual(['0–5 cm', '5–15 cm']);
    const deep = result[1];
    expect(deep.perM2.estimate).toBe(0);
    expect(deep.perM2.lower).toBe(0);
    // x = 0: exact upper 95 % limit 3.689 (standard Poisson table, value recalled from memory).
    expect((deep.perM2.upper * deep.areaM2).toFixed(3)).toBe('3.689');
  });

  it('gives clear messages for bad samples, naming the record', () => {
    const bad = [
      { layer: '0–5 cm', coreDiameterCm: 5, cores: 1, count: -3 },
      { layer: '0–5 cm', coreDiameterCm: 0, cores: 1, count: 2 },
      { layer: '0–5 cm', coreDiameterCm: 5, cores: 0, count: 2 },
      { layer: ' ', coreDiameterCm: 5, cores: 1, count: 2.5 },
    ];
    let error: unknown;
    try {
      estimateSeedbankDensity(bad);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    const issues = (error as RecordsError).issues;
    expect(issues).toContainEqual({ index: 0, message: 'seeds counted must not be negative, got -3' });
    expect(issues).toContainEqual({
      index: 1,
      message: 'core diameter (cm) must be a number greater than 0, got 0',
    });
    expect(issues).toContainEqual({ index: 2, message: 'number of cores must be at least 1' });
    expect(issues.filter((i) => i.index === 3).map((i) => i.message)).toEqual([
      'layer must be a non-empty text, got " "',
      'seeds counted must be a whole number, got 2.5',
    ]);
    expect((error as Error).message).toMatch(
      /^soil seedbank samples: record 1: seeds counted must not be negative/,
    );
    expect(() => estimateSeedbankDensity([])).toThrow(/no soil samples/);
  });
});
