import fCdf from '@stdlib/stats-base-dists-f-cdf';
import { describe, expect, it } from 'vitest';
import { fisherLsd, lsdComparisons } from '../../../models/records/fisher-lsd';
import { rcbdAnova, type PlotObservation } from '../../../models/records/rcbd-anova';
import { RecordsError } from '../../../models/records/records-error';
import { fUpperTailReference, tQuantileReference } from './reference';

/** Treatment rows × block columns → plots. */
function plots(treatments: string[], table: number[][]): PlotObservation[] {
  return table.flatMap((row, i) =>
    row.map((response, j) => ({ treatment: treatments[i], block: `B${j + 1}`, response })),
  );
}

// Montgomery, Design and Analysis of Experiments (6th ed. and later), Example 4.1, the vascular
// graft experiment: yield (%) at four extrusion pressures (psi) in six batches of resin (blocks)
// (data and ANOVA table recalled from memory).
const GRAFT = plots(
  ['8500', '8700', '8900', '9100'],
  [
    [90.3, 89.2, 98.2, 93.9, 87.4, 97.9],
    [92.5, 89.5, 90.6, 94.7, 87.0, 95.8],
    [85.5, 90.8, 89.6, 86.2, 88.0, 93.4],
    [82.5, 89.5, 85.6, 87.4, 78.9, 90.7],
  ],
);

// Montgomery, Design and Analysis of Experiments (5th ed.), Example 4-1: hardness readings of four
// tip types on four test coupons (blocks) (data and ANOVA table recalled from memory).
const HARDNESS = plots(
  ['tip 1', 'tip 2', 'tip 3', 'tip 4'],
  [
    [9.3, 9.4, 9.6, 10.0],
    [9.4, 9.3, 9.8, 9.9],
    [9.2, 9.4, 9.5, 9.7],
    [9.7, 9.6, 10.0, 10.2],
  ],
);

describe('RCBD analysis of variance', () => {
  it('reproduces the vascular graft ANOVA table (Montgomery, Example 4.1)', () => {
    // Printed: pressure SS 178.17 (3 df, MS 59.39, F0 = 8.11, P = 0.0019); batches SS 192.25
    // (5 df, MS 38.45); error SS 109.89 (15 df, MS 7.33); total SS 480.31 (23 df).
    const a = rcbdAnova(GRAFT);
    expect(a.treatmentsRow.ss.toFixed(2)).toBe('178.17');
    expect(a.treatmentsRow.df).toBe(3);
    expect(a.treatmentsRow.ms?.toFixed(2)).toBe('59.39');
    expect(a.treatmentsRow.f?.toFixed(2)).toBe('8.11');
    expect(a.treatmentsRow.p?.toFixed(4)).toBe('0.0019');
    expect(a.blocksRow.ss.toFixed(2)).toBe('192.25');
    expect(a.blocksRow.df).toBe(5);
    expect(a.blocksRow.ms?.toFixed(2)).toBe('38.45');
    expect(a.errorRow.ss.toFixed(2)).toBe('109.89');
    expect(a.errorRow.df).toBe(15);
    expect(a.errorRow.ms?.toFixed(2)).toBe('7.33');
    expect(a.totalRow.ss.toFixed(2)).toBe('480.31');
    expect(a.totalRow.df).toBe(23);
  });

  it('reproduces the hardness-testing ANOVA (Montgomery 5th ed., Example 4-1)', () => {
    // Printed on data coded as 10·(y − 9.5): SS tips 38.50, coupons 82.50, error 8.00, total 129.00,
    // F0 = 14.44, P = 0.0009; the uncoded sums of squares are those / 100.
    const a = rcbdAnova(HARDNESS);
    expect((100 * a.treatmentsRow.ss).toFixed(2)).toBe('38.50');
    expect((100 * a.blocksRow.ss).toFixed(2)).toBe('82.50');
    expect((100 * a.errorRow.ss).toFixed(2)).toBe('8.00');
    expect((100 * a.totalRow.ss).toFixed(2)).toBe('129.00');
    expect(a.treatmentsRow.f?.toFixed(2)).toBe('14.44');
    expect(a.treatmentsRow.p?.toFixed(4)).toBe('0.0009');
  });

  it('satisfies SS_total = SS_blocks + SS_treatments + SS_error and matches the F tail of formulajs', () => {
    for (const data of [GRAFT, HARDNESS]) {
      const a = rcbdAnova(data);
      const sum = a.blocksRow.ss + a.treatmentsRow.ss + a.errorRow.ss;
      expect(sum / a.totalRow.ss).toBeCloseTo(1, 12);
      expect(a.blocksRow.df + a.treatmentsRow.df + a.errorRow.df).toBe(a.totalRow.df);
      for (const row of [a.blocksRow, a.treatmentsRow]) {
        expect(row.f).toBeCloseTo((row.ms as number) / (a.errorRow.ms as number), 12);
        // @stdlib's F CDF, and formulajs (jStat) F.DIST.RT as an implementation independent of it.
        expect(row.p).toBeCloseTo(1 - fCdf(row.f as number, row.df, a.errorRow.df), 14);
        expect(row.p).toBeCloseTo(fUpperTailReference(row.f as number, row.df, a.errorRow.df), 8);
      }
    }
  });

  it('gives p = 0.05 and 0.01 at the printed F table critical values', () => {
    // F table (e.g. Montgomery, Appendix table IV): F(0.05; 3, 15) = 3.29, F(0.01; 3, 15) = 5.42
    // (values recalled from memory). A data set is built whose treatment F equals each value.
    for (const [critical, alpha] of [
      [3.29, 0.05],
      [5.42, 0.01],
    ]) {
      const base = rcbdAnova(GRAFT);
      // Scaling the treatment effects by c multiplies SS_treatments by c² and leaves the error alone.
      const c = Math.sqrt(critical / (base.treatmentsRow.f as number));
      const scaled = GRAFT.map((p) => {
        const i = base.treatments.indexOf(p.treatment);
        return { ...p, response: p.response + (c - 1) * (base.means[i] - base.grandMean) };
      });
      const a = rcbdAnova(scaled);
      expect(a.treatmentsRow.f).toBeCloseTo(critical, 9);
      expect(a.treatmentsRow.p?.toFixed(3)).toBe(alpha.toFixed(3));
    }
  });

  it('has the coefficient of variation 100·√MSE / grand mean', () => {
    // Hand calculation from the printed graft table: 100·√7.33 / 89.80 = 3.01 % (grand mean 2155.1 / 24).
    const a = rcbdAnova(GRAFT);
    expect(a.grandMean.toFixed(2)).toBe('89.80');
    expect(a.cvPercent.toFixed(2)).toBe('3.01');
  });
});

describe("Fisher's LSD", () => {
  it('reproduces the plasma-etching LSD of Montgomery (ch. 3): 2.120·√(2·333.70/5) = 24.49', () => {
    // Montgomery, Design and Analysis of Experiments, ch. 3, Fisher LSD for the etch-rate experiment
    // (a = 4 RF powers, n = 5, MS_E = 333.70 on 16 df) (value recalled from memory).
    expect(fisherLsd(333.7, 16, 5).toFixed(2)).toBe('24.49');
  });

  it('gives 3.33 for the vascular graft experiment from its printed MS_E and t table value', () => {
    // Hand calculation from the printed table: t(0.025; 15) = 2.131 (t table), MS_E = 7.33, b = 6:
    // 2.131·√(2·7.33/6) = 3.33; t from formulajs T.INV as an independent quantile.
    const lsd = lsdComparisons(rcbdAnova(GRAFT));
    expect(lsd.method).toBe("Fisher's LSD");
    expect(lsd.lsd.toFixed(2)).toBe((2.131 * Math.sqrt((2 * 7.33) / 6)).toFixed(2));
    expect(lsd.lsd).toBeCloseTo(tQuantileReference(0.975, 15) * Math.sqrt((2 * 7.32575) / 6), 6);
    expect(lsd.fTestSignificant).toBe(true);
    // Treatment means 92.82, 91.68, 88.92, 85.77 (hand calculation from the data): 8500 vs 8700
    // differ by 1.13 < 3.33; 8500 vs 9100 by 7.05 > 3.33.
    const pair = (a: string, b: string) => lsd.comparisons.find((c) => c.a === a && c.b === b);
    expect(pair('8500', '8700')?.significant).toBe(false);
    expect(pair('8500', '9100')?.significant).toBe(true);
    expect(pair('8500', '9100')?.difference.toFixed(2)).toBe('7.05');
    expect(lsd.comparisons).toHaveLength(6);
  });
});

describe('RCBD validation', () => {
  it('reports a missing plot, a doubled plot and a text response', () => {
    const broken = GRAFT.filter((p) => !(p.treatment === '9100' && p.block === 'B3'));
    expect(() => rcbdAnova(broken)).toThrow(
      /unbalanced design: treatment 9100 is missing from block\(s\) B3; every treatment must occur once in every block/,
    );
    let error: unknown;
    try {
      rcbdAnova([
        ...GRAFT,
        { treatment: '8500', block: 'B1', response: 91 },
        { treatment: '8700', block: 'B2', response: Number('n/a') },
      ]);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    expect((error as RecordsError).issues).toEqual([
      { index: 24, message: 'treatment 8500 appears more than once in block B1' },
      { index: 25, message: 'response must be a number, got NaN' },
      { index: 25, message: 'treatment 8700 appears more than once in block B2' },
    ]);
    expect(() => rcbdAnova(GRAFT.filter((p) => p.block === 'B1'))).toThrow(/at least 2 blocks, found 1/);
  });
});
