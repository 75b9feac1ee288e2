import { describe, expect, it } from 'vitest';
import { analyseGermination, type GerminationRecord } from '../../../models/records/germination';
import { RecordsError } from '../../../models/records/records-error';
import { fahrenheitToCelsius } from '../../../models/records/units';
import { tQuantileReference, wilsonReference } from './reference';

const DAYS = [3, 7, 14, 21];

/** One dish of `seeds` seeds at `temperatureC`, counted on DAYS. */
function dish(
  testId: string,
  temperatureC: number,
  seeds: number,
  cumulative: number[],
): GerminationRecord[] {
  return cumulative.map((cumulativeGerminated, i) => ({
    testId,
    temperatureC,
    seeds,
    day: DAYS[i],
    cumulativeGerminated,
  }));
}

// Germination tested at 59, 68 and 77 °F (15, 20, 25 °C) — common practice, no published source.
// Invented counts: two dishes of 50 seeds per temperature.
const tempsC = [59, 68, 77].map(fahrenheitToCelsius);
const records: GerminationRecord[] = [
  ...dish('A', tempsC[0], 50, [0, 4, 12, 18]),
  ...dish('B', tempsC[0], 50, [0, 6, 14, 20]),
  ...dish('C', tempsC[1], 50, [2, 15, 30, 34]),
  ...dish('D', tempsC[1], 50, [4, 18, 31, 36]),
  ...dish('E', tempsC[2], 50, [10, 28, 38, 40]),
  ...dish('F', tempsC[2], 50, [8, 25, 36, 39]),
];

describe('germination tests', () => {
  it('converts the usual test temperatures 59, 68, 77 °F exactly to 15, 20, 25 °C (NIST SP 811)', () => {
    // t/°C = (t/°F − 32)/1.8 — common practice, no published source for the choice of temperatures.
    expect(tempsC).toEqual([15, 20, 25]);
  });

  it('gives the final fraction per temperature with a Wilson interval and picks the best temperature', () => {
    const result = analyseGermination(records);
    expect(result.temperatures.map((t) => [t.temperatureC, t.fraction.successes, t.fraction.trials])).toEqual(
      [
        [15, 38, 100],
        [20, 70, 100],
        [25, 79, 100],
      ],
    );
    const [lower, upper] = wilsonReference(79, 100);
    expect(result.temperatures[2].fraction.lower).toBeCloseTo(lower, 12);
    expect(result.temperatures[2].fraction.upper).toBeCloseTo(upper, 12);
    // Highest final fraction among those tested: 25 °C (77 °F).
    expect(result.best).toEqual({ temperatureC: 25, tiedTemperaturesC: [25] });
  });

  it('computes T50 by linear interpolation between the counts bracketing half the final count', () => {
    // Coolbear, Francis & Grierson (1984), J. Exp. Bot. 35:1609–1617:
    // T50 = tᵢ + (N/2 − nᵢ)(tⱼ − tᵢ)/(nⱼ − nᵢ). Hand calculations:
    //   dish A: N = 18, half 9 between day 7 (4) and day 14 (12): 7 + 5·7/8 = 11.375
    //   dish B: N = 20, half 10 between day 7 (6) and day 14 (14): 7 + 4·7/8 = 10.5
    //   dish E: N = 40, half 20 between day 3 (10) and day 7 (28): 3 + 10·4/18
    //   dish F: N = 39, half 19.5 between day 3 (8) and day 7 (25): 3 + 11.5·4/17
    const result = analyseGermination(records);
    const t50 = Object.fromEntries(result.tests.map((t) => [t.testId, t.t50Days]));
    expect(t50.A).toBeCloseTo(11.375, 12);
    expect(t50.B).toBeCloseTo(10.5, 12);
    expect(t50.E).toBeCloseTo(3 + 40 / 18, 12);
    expect(t50.F).toBeCloseTo(3 + 46 / 17, 12);
    // Mean over the two dishes with a t interval on 1 df (t from formulajs T.INV).
    const cool = result.temperatures[0].t50Days;
    const mean = (11.375 + 10.5) / 2;
    const se = Math.abs(11.375 - 10.5) / 2;
    expect(cool?.meanDays).toBeCloseTo(mean, 12);
    expect(cool?.dishes).toBe(2);
    expect(cool?.lower).toBeCloseTo(mean - tQuantileReference(0.975, 1) * se, 6);
    expect(cool?.upper).toBeCloseTo(mean + tQuantileReference(0.975, 1) * se, 6);
  });

  it('starts an interpolation from day 0 when half the final count is reached by the first count', () => {
    // No day-0 line: the dish is taken to hold 0 germinated at sowing; N = 40, half 20 reached by
    // day 7 (30): T50 = 0 + 20·7/30 (hand calculation).
    const result = analyseGermination([
      { testId: 'G', temperatureC: 20, seeds: 50, day: 7, cumulativeGerminated: 30 },
      { testId: 'G', temperatureC: 20, seeds: 50, day: 14, cumulativeGerminated: 40 },
    ]);
    expect(result.tests[0].t50Days).toBeCloseTo(140 / 30, 12);
    // One dish shows no spread between dishes: no interval rather than a zero-width one.
    expect(result.temperatures[0].t50Days).toEqual({
      meanDays: 140 / 30,
      lower: null,
      upper: null,
      confidence: 0.95,
      dishes: 1,
    });
  });

  it('returns the count day itself when half the final count falls exactly on it', () => {
    // Coolbear et al. (1984) with nⱼ = N/2 gives T50 = tⱼ: N = 20, 10 germinated on day 4 → 4 days;
    // and a dish already past half on its day-0 count (6 of a final 10) → 0 days.
    const result = analyseGermination([
      { testId: 'H', temperatureC: 20, seeds: 30, day: 0, cumulativeGerminated: 0 },
      { testId: 'H', temperatureC: 20, seeds: 30, day: 4, cumulativeGerminated: 10 },
      { testId: 'H', temperatureC: 20, seeds: 30, day: 8, cumulativeGerminated: 20 },
      { testId: 'K', temperatureC: 25, seeds: 30, day: 0, cumulativeGerminated: 6 },
      { testId: 'K', temperatureC: 25, seeds: 30, day: 5, cumulativeGerminated: 10 },
    ]);
    expect(result.tests.map((t) => t.t50Days)).toEqual([4, 0]);
  });

  it('breaks a tie in final fraction by the faster T50, and lists every tied temperature', () => {
    const tie = analyseGermination([
      { testId: 'slow', temperatureC: 15, seeds: 40, day: 14, cumulativeGerminated: 30 },
      { testId: 'fast', temperatureC: 25, seeds: 20, day: 3, cumulativeGerminated: 12 },
      { testId: 'fast', temperatureC: 25, seeds: 20, day: 14, cumulativeGerminated: 15 },
      { testId: 'low', temperatureC: 20, seeds: 20, day: 14, cumulativeGerminated: 2 },
    ]);
    // 30/40 = 15/20 = 0.75; 25 °C reaches half its final count sooner.
    expect(tie.best).toEqual({ temperatureC: 25, tiedTemperaturesC: [15, 25] });
    const none = analyseGermination([
      { testId: 'x', temperatureC: 20, seeds: 10, day: 21, cumulativeGerminated: 0 },
    ]);
    expect(none.best).toBeNull();
    expect(none.tests[0].t50Days).toBeNull();
  });

  it('rejects impossible counts with row-level messages', () => {
    let error: unknown;
    try {
      analyseGermination([
        { testId: 'A', temperatureC: 20, seeds: 25, day: 3, cumulativeGerminated: 10 },
        { testId: 'A', temperatureC: 20, seeds: 25, day: 7, cumulativeGerminated: 8 },
        { testId: 'A', temperatureC: 20, seeds: 25, day: 14, cumulativeGerminated: 30 },
        { testId: 'B', temperatureC: 15, seeds: 25, day: 3, cumulativeGerminated: -1 },
        { testId: 'A', temperatureC: 25, seeds: 20, day: 7, cumulativeGerminated: 9 },
      ]);
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    expect((error as RecordsError).issues).toEqual([
      { index: 2, message: 'test A, day 14: 30 germinated exceeds the 25 seeds in the dish' },
      { index: 3, message: 'cumulative germinated must not be negative, got -1' },
      { index: 4, message: 'test A is at 25 °C here but 20 °C elsewhere' },
      { index: 4, message: 'test A has 20 seeds here but 25 elsewhere' },
      { index: 4, message: 'test A has two counts on day 7' },
      { index: 1, message: 'test A: cumulative germinated falls from 10 on day 3 to 8 on day 7' },
    ]);
    expect((error as Error).message).toMatch(
      /^germination tests: record 3: test A, day 14: 30 germinated exceeds/,
    );
  });
});
