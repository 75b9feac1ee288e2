import { describe, expect, it } from 'vitest';
import type { PlantCount } from '../../../models/records/plant-counts';
import { estimateStageDensities } from '../../../models/records/plant-density';
import { RecordsError } from '../../../models/records/records-error';
import { estimateTransition } from '../../../models/records/transitions';
import { wilsonReference } from './reference';

const line = (
  quadrat: string,
  year: number,
  stage: string,
  count: number,
  quadratAreaM2 = 1,
): PlantCount => ({
  quadrat,
  year,
  stage,
  count,
  quadratAreaM2,
});

// An invented survey of three permanent quadrats with tagged plants; Q3 is a 0.5 m × 0.5 m frame.
// Rosettes are counted apart from flowering plants.
const survey: PlantCount[] = [
  line('Q1', 2021, 'seedling', 25),
  line('Q1', 2021, 'rosette', 100),
  line('Q1', 2021, 'flowering', 40),
  line('Q2', 2021, 'rosette', 82),
  line('Q2', 2021, 'flowering', 41),
  line('Q3', 2021, 'rosette', 8, 0.25),
  line('Q1', 2022, 'rosette', 70),
  line('Q1', 2022, 'flowering', 15),
  line('Q2', 2022, 'rosette', 50),
  line('Q2', 2022, 'flowering', 12),
  line('Q3', 2022, 'rosette', 5, 0.25),
];

describe('annual transition rates from quadrat counts', () => {
  it('flowering fraction 81/263 reproduces Newcombe (1998) Table I, Wilson 0.2553–0.3662', () => {
    // Q1 and Q2 in 2021: 40 + 41 = 81 flowering among (100 + 40) + (82 + 41) = 263 established
    // plants, the first example of Newcombe, Stat. Med. 17:857–872, Table I: Wilson 0.2553–0.3662,
    // exact (Clopper–Pearson) 0.2527–0.3676 (values recalled from memory).
    const q1q2 = survey.filter((c) => c.quadrat !== 'Q3' && c.year === 2021);
    const fraction = estimateTransition(q1q2, {
      from: ['rosette', 'flowering'],
      to: ['flowering'],
      yearLag: 0,
    });
    expect([fraction.pooled.successes, fraction.pooled.trials]).toEqual([81, 263]);
    expect(fraction.pooled.lower.toFixed(4)).toBe('0.2553');
    expect(fraction.pooled.upper.toFixed(4)).toBe('0.3662');
    const exact = estimateTransition(
      q1q2,
      { from: ['rosette', 'flowering'], to: ['flowering'], yearLag: 0 },
      { method: 'clopper-pearson' },
    );
    expect([exact.pooled.lower.toFixed(4), exact.pooled.upper.toFixed(4)]).toEqual(['0.2527', '0.3676']);
  });

  it('rosette survival pairs each quadrat with its own count a year later', () => {
    // Hand tally: Q1 100 rosettes → 85 established in 2022, Q2 82 → 62, Q3 8 → 5: 152 / 190.
    const survival = estimateTransition(survey, {
      from: ['rosette'],
      to: ['rosette', 'flowering'],
      yearLag: 1,
    });
    expect([survival.pooled.successes, survival.pooled.trials]).toEqual([152, 190]);
    expect(survival.pooled.estimate).toBeCloseTo(0.8, 12);
    const [lower, upper] = wilsonReference(152, 190);
    expect(survival.pooled.lower).toBeCloseTo(lower, 12);
    expect(survival.pooled.upper).toBeCloseTo(upper, 12);
    expect(survival.byYear.map((y) => y.year)).toEqual([2021]);
    expect(survival.pairs).toBe(3);
    expect(survival.unpaired).toBe(0);
  });

  it('reports each year apart and counts quadrats missed in a later survey', () => {
    const withGap = [
      ...survey,
      line('Q4', 2021, 'rosette', 6),
      line('Q4', 2022, 'rosette', 4),
      line('Q4', 2023, 'rosette', 3),
    ];
    const flowering = estimateTransition(withGap, {
      from: ['rosette', 'flowering'],
      to: ['flowering'],
      yearLag: 0,
    });
    // 2021: 81 / (263 + 8 + 6) = 81/277; 2022: 27 / (85 + 62 + 5 + 4) = 27/156; 2023: 0 / 3.
    expect(flowering.byYear.map((y) => [y.year, y.rate.successes, y.rate.trials])).toEqual([
      [2021, 81, 277],
      [2022, 27, 156],
      [2023, 0, 3],
    ]);
    const survival = estimateTransition(withGap, {
      from: ['rosette'],
      to: ['rosette', 'flowering'],
      yearLag: 1,
    });
    // Q1–Q3 were not surveyed in 2023 although Q4 was: three quadrat-years without a successor.
    expect(survival.unpaired).toBe(3);
    expect(survival.byYear.map((y) => [y.year, y.rate.successes, y.rate.trials])).toEqual([
      [2021, 156, 196],
      [2022, 3, 4],
    ]);
  });

  it('refuses a "rate" where the later count exceeds the earlier one', () => {
    const recruited = [line('Q1', 2021, 'rosette', 5), line('Q1', 2022, 'rosette', 7)];
    expect(() => estimateTransition(recruited, { from: ['rosette'], to: ['rosette'], yearLag: 1 })).toThrow(
      /quadrat Q1: 7 rosette in 2022 exceed 5 rosette in 2021/,
    );
  });

  it('names unknown stages, negative counts, duplicates and inconsistent quadrat sizes', () => {
    expect(() => estimateTransition(survey, { from: ['rosete'], to: ['flowering'], yearLag: 0 })).toThrow(
      /stage "rosete" does not occur in the counts \(stages present: seedling, rosette, flowering\)/,
    );
    let error: unknown;
    try {
      estimateTransition(
        [
          line('Q1', 2021, 'rosette', -2),
          line('Q1', 2021, 'rosette', 3),
          line('Q1', 2021, 'rosette', 4),
          line('Q1', 2022, 'rosette', 3, 0.5),
        ],
        { from: ['rosette'], to: ['rosette'], yearLag: 1 },
      );
    } catch (e) {
      error = e;
    }
    expect(error).toBeInstanceOf(RecordsError);
    expect((error as RecordsError).issues).toEqual([
      { index: 0, message: 'plant count must not be negative, got -2' },
      { index: 2, message: 'quadrat Q1, 2021, rosette is counted twice' },
      { index: 3, message: 'quadrat Q1 is 0.5 m² here but 1 m² elsewhere' },
    ]);
  });
});

describe('stage densities from quadrat counts', () => {
  it('pools plants over the area of the quadrats surveyed each year', () => {
    const densities = estimateStageDensities(survey);
    const rosettes2021 = densities.find((d) => d.year === 2021 && d.stage === 'rosette');
    // (100 + 82 + 8) rosettes on 1 + 1 + 0.25 m² = 84.44 /m²; × 0.09290304 = 7.845 /ft² (NIST SP 811).
    expect(rosettes2021?.perM2.estimate).toBeCloseTo(190 / 2.25, 10);
    expect(rosettes2021?.perFt2.estimate.toFixed(3)).toBe('7.845');
    // Seedlings were only written down in Q1; Q2 and Q3 were surveyed, so they count as 0.
    const seedlings2021 = densities.find((d) => d.year === 2021 && d.stage === 'seedling');
    expect(seedlings2021?.samples).toBe(3);
    expect(seedlings2021?.perM2.estimate).toBeCloseTo(25 / 2.25, 10);
    expect(densities.map((d) => `${d.year} ${d.stage}`)).toEqual([
      '2021 seedling',
      '2021 rosette',
      '2021 flowering',
      '2022 seedling',
      '2022 rosette',
      '2022 flowering',
    ]);
  });
});
