import { mean as ssMean, sampleStandardDeviation } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { analyseEfficacy, type EfficacyPlot } from '../../../models/records/efficacy';
import { RecordsError } from '../../../models/records/records-error';
import { metresToFeet, squareMetresToSquareFeet } from '../../../models/records/units';
import { fUpperTailReference, tQuantileReference } from './reference';

const BLOCKS = ['I', 'II', 'III', 'IV'];
const CHECK = 'untreated check';

/** One timing of an invented trial: weed plants per plot, treatment rows × blocks I–IV. */
function timing(name: string, rows: Record<string, number[]>): EfficacyPlot[] {
  return Object.entries(rows).flatMap(([treatment, counts]) =>
    counts.map((response, j) => ({ treatment, block: BLOCKS[j], response, timing: name })),
  );
}

// Efficacy trials are laid out as randomised complete blocks with four replicates, assessed 2, 4 and
// 8 weeks after treatment (WAT) and six months after a fall treatment — common practice, no
// published source. The counts are invented.
const TRIAL: EfficacyPlot[] = [
  ...timing('2 WAT', {
    [CHECK]: [40, 50, 60, 50],
    'herbicide A': [4, 5, 6, 5],
    'herbicide B': [20, 20, 30, 30],
    mowing: [36, 45, 54, 45],
  }),
  ...timing('4 WAT', {
    [CHECK]: [50, 50, 50, 50],
    'herbicide A': [2, 3, 2, 3],
    'herbicide B': [10, 15, 10, 15],
    mowing: [55, 60, 45, 50],
  }),
  ...timing('8 WAT', {
    [CHECK]: [40, 40, 40, 40],
    'herbicide A': [8, 4, 4, 8],
    'herbicide B': [20, 20, 20, 20],
    mowing: [30, 30, 30, 30],
  }),
  ...timing('6 months after fall treatment', {
    [CHECK]: [20, 30, 25, 25],
    'herbicide A': [10, 15, 5, 10],
    'herbicide B': [20, 30, 25, 25],
    mowing: [20, 30, 25, 25],
  }),
];

describe('efficacy trial plots (facts of the trade)', () => {
  it('converts the usual 2.4 × 9.1 m plot to ≈ 7.9 × 29.9 ft and 21.84 m² (1 ft = 0.3048 m exactly)', () => {
    // Plots of 2.4 × 9.1 m — common practice, no published source. Foot from NIST SP 811.
    expect(metresToFeet(2.4).toFixed(1)).toBe('7.9');
    expect(metresToFeet(9.1).toFixed(1)).toBe('29.9');
    expect((2.4 * 9.1).toFixed(2)).toBe('21.84');
    // 21.84 m² / 0.09290304 m²/ft² = 235.08 ft² = 7.874 ft × 29.856 ft.
    expect(squareMetresToSquareFeet(21.84)).toBeCloseTo(metresToFeet(2.4) * metresToFeet(9.1), 10);
    expect(squareMetresToSquareFeet(21.84).toFixed(1)).toBe('235.1');
  });
});

describe('% control per treatment and timing', () => {
  const analyses = analyseEfficacy(TRIAL, { check: CHECK });
  const at = (name: string) => analyses.find((a) => a.timing === name);
  const treatment = (name: string, t: string) => at(name)?.treatments.find((x) => x.treatment === t);

  it('analyses each assessment timing apart, four blocks each', () => {
    expect(analyses.map((a) => a.timing)).toEqual([
      '2 WAT',
      '4 WAT',
      '8 WAT',
      '6 months after fall treatment',
    ]);
    for (const a of analyses) expect(a.anova.blocks).toHaveLength(4);
  });

  it("gives Abbott's % control on the means and per block against that block's check", () => {
    // Abbott (1925), J. Econ. Entomol. 18:265–267: 100·(1 − treated/check). Hand calculations, 2 WAT:
    // check mean 50, herbicide A mean 5 → 90 %; herbicide B mean 25 → 50 %, per block
    // 100·(1 − 20/40, 20/50, 30/60, 30/50) = 50, 60, 50, 40 %.
    expect(treatment('2 WAT', 'herbicide A')?.percentControl).toBeCloseTo(90, 12);
    const b = treatment('2 WAT', 'herbicide B');
    expect(b?.percentControl).toBeCloseTo(50, 12);
    expect(b?.perBlock.map((x) => Math.round(x.percentControl * 1e9) / 1e9)).toEqual([50, 60, 50, 40]);
    // Mean and SD across blocks checked with simple-statistics (n − 1 SD).
    expect(b?.meanPercentControl).toBeCloseTo(ssMean([50, 60, 50, 40]), 10);
    expect(b?.sdPercentControl).toBeCloseTo(sampleStandardDeviation([50, 60, 50, 40]), 10);
    expect(b?.efficacy.mean).toBeCloseTo(0.5, 12);
    expect(b?.efficacy.sd).toBeCloseTo(sampleStandardDeviation([0.5, 0.6, 0.5, 0.4]), 12);
    expect(b?.adoptable).toBe(true);
    // 4 WAT herbicide A: 96, 94, 96, 94 % → 95 ± 1.155 %.
    const a4 = treatment('4 WAT', 'herbicide A');
    expect(a4?.meanPercentControl).toBeCloseTo(95, 10);
    expect(a4?.sdPercentControl).toBeCloseTo(sampleStandardDeviation([96, 94, 96, 94]), 10);
    // Six months after the fall treatment herbicide A still gives 50, 50, 80, 60 %.
    expect(treatment('6 months after fall treatment', 'herbicide A')?.meanPercentControl).toBeCloseTo(60, 10);
  });

  it('keeps negative % control visible and refuses to adopt it', () => {
    // 4 WAT mowing: 100·(1 − 55/50, 60/50, 45/50, 50/50) = −10, −20, 10, 0 % → mean −5 %.
    const mowing = treatment('4 WAT', 'mowing');
    expect(mowing?.meanPercentControl).toBeCloseTo(-5, 10);
    expect(mowing?.adoptable).toBe(false);
    expect(mowing?.adoptNote).toMatch(/negative/);
    // No effect at all (0 ± 0) is a valid efficacy of 0.
    expect(treatment('6 months after fall treatment', 'herbicide B')?.efficacy).toEqual({ mean: 0, sd: 0 });
    expect(treatment('6 months after fall treatment', 'herbicide B')?.adoptable).toBe(true);
  });

  it('refuses a spread no beta distribution on 0–1 can have (sd² ≥ mean·(1 − mean))', () => {
    // Per-block control 0, 100, 0, 100 %: mean 0.5, SD 0.577 > √(0.5·0.5) = 0.5.
    const [erratic] = analyseEfficacy(
      [
        ...[10, 10, 10, 10].map((response, j) => ({ treatment: CHECK, block: BLOCKS[j], response })),
        ...[10, 0, 10, 0].map((response, j) => ({ treatment: 'spot spray', block: BLOCKS[j], response })),
      ],
      { check: CHECK },
    );
    expect(erratic.timing).toBeNull();
    expect(erratic.treatments[0].efficacy.sd).toBeCloseTo(sampleStandardDeviation([0, 1, 0, 1]), 12);
    expect(erratic.treatments[0].adoptable).toBe(false);
    expect(erratic.treatments[0].adoptNote).toMatch(/too large for a mean of 0.500/);
  });

  it('runs the RCBD ANOVA and Fisher LSD on the raw responses of each timing', () => {
    const a = at('2 WAT');
    const anova = a?.anova;
    expect(anova?.treatments).toEqual([CHECK, 'herbicide A', 'herbicide B', 'mowing']);
    expect(
      ((anova?.blocksRow.ss ?? 0) + (anova?.treatmentsRow.ss ?? 0) + (anova?.errorRow.ss ?? 0)) /
        (anova?.totalRow.ss ?? 1),
    ).toBeCloseTo(1, 12);
    expect(anova?.errorRow.df).toBe(9);
    expect(anova?.treatmentsRow.p).toBeCloseTo(
      fUpperTailReference(anova?.treatmentsRow.f as number, 3, 9),
      8,
    );
    // Fisher's LSD = t(0.975; 9)·√(2·MSE/4), t from formulajs.
    expect(a?.lsd.lsd).toBeCloseTo(
      tQuantileReference(0.975, 9) * Math.sqrt(((anova?.errorRow.ms as number) * 2) / 4),
      6,
    );
    expect(a?.lsd.fTestSignificant).toBe(true);
    expect(a?.checkMean).toBe(50);
  });
});

describe('efficacy validation', () => {
  it('names a missing untreated check', () => {
    expect(() => analyseEfficacy(TRIAL, { check: 'control' })).toThrow(
      /timing 2 WAT: the untreated check "control" is missing \(treatments: untreated check, herbicide A, herbicide B, mowing\)/,
    );
  });

  it('reports an unbalanced timing with the original record numbers', () => {
    const missing = TRIAL.findIndex(
      (p) => p.timing === '4 WAT' && p.treatment === 'mowing' && p.block === 'III',
    );
    const doubled = [...TRIAL.filter((_, i) => i !== missing), { ...TRIAL[0] }];
    let error: unknown;
    try {
      analyseEfficacy(doubled, { check: CHECK });
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    expect((error as RecordsError).issues).toEqual([
      {
        index: doubled.length - 1,
        message: 'timing 2 WAT: treatment untreated check appears more than once in block I',
      },
      {
        index: null,
        message:
          'timing 4 WAT: unbalanced design: treatment mowing is missing from block(s) III; every treatment must occur once in every block',
      },
    ]);
  });

  it('rejects negative responses, a check with no weeds, and timings given for only some plots', () => {
    const negative = TRIAL.map((p, i) => (i === 5 ? { ...p, response: -1 } : p));
    expect(() => analyseEfficacy(negative, { check: CHECK })).toThrow(
      /record 6: response \(biomass or count\) must not be negative, got -1/,
    );
    const emptyCheck = TRIAL.map((p) =>
      p.treatment === CHECK && p.block === 'II' && p.timing === '8 WAT' ? { ...p, response: 0 } : p,
    );
    expect(() => analyseEfficacy(emptyCheck, { check: CHECK })).toThrow(
      /timing 8 WAT: the untreated check has no weeds in block\(s\) II, so % control there is undefined/,
    );
    const mixed = TRIAL.map((p, i) =>
      i === 0 ? { treatment: p.treatment, block: p.block, response: p.response } : p,
    );
    expect(() => analyseEfficacy(mixed, { check: CHECK })).toThrow(
      /63 of 64 plots have an assessment timing: give it for all or none/,
    );
  });
});
