import { median } from 'simple-statistics';
import { describe, expect, it } from 'vitest';
import { summarizeDecline, yearsUntilDecline } from '../../../models/summary/decline';

/** Seedbank decaying geometrically: x_t = x0·q^t. */
function geometric(x0: number, q: number, years: number): number[] {
  return Array.from({ length: years + 1 }, (_, t) => x0 * q ** t);
}

describe('yearsUntilDecline', () => {
  it('matches the closed form ⌈ln(1 − f)/ln q⌉ for geometric decay', () => {
    // x0·q^t ≤ (1 − f)·x0 ⇔ t ≥ ln(1 − f)/ln q. For q = 0.5: 90 % → 0.5^4 = 0.0625 (t = 4);
    // 99 % → 0.5^7 ≈ 0.0078 (t = 7).
    expect(yearsUntilDecline(geometric(5000, 0.5, 20), 0.9)).toBe(4);
    expect(yearsUntilDecline(geometric(5000, 0.5, 20), 0.99)).toBe(7);
    for (const q of [0.3, 0.62, 0.8, 0.95]) {
      for (const f of [0.9, 0.99]) {
        expect(yearsUntilDecline(geometric(1234, q, 200), f)).toBe(
          Math.ceil(Math.log(1 - f) / Math.log(q) - 1e-9),
        );
      }
    }
  });

  it('counts an exact 90 % / 99 % decline despite 0.1 and 0.01 not being exact in binary', () => {
    expect(yearsUntilDecline([100, 50, 10], 0.9)).toBe(2);
    expect(yearsUntilDecline([3, 1, 0.3], 0.9)).toBe(2);
    expect(yearsUntilDecline([700, 7], 0.99)).toBe(1);
  });

  it('is the first passage (a later rebound does not undo it) and null when never reached', () => {
    expect(yearsUntilDecline([100, 5, 400, 900], 0.9)).toBe(1);
    expect(yearsUntilDecline([100, 80, 60, 40], 0.9)).toBeNull();
    expect(yearsUntilDecline([100], 0.9)).toBeNull();
    expect(yearsUntilDecline([0, 0, 0], 0.9)).toBeNull();
  });

  it('rejects fractions outside (0, 1)', () => {
    expect(() => yearsUntilDecline([1, 0], 90)).toThrow(/decline fraction must be in \(0, 1\)/);
    expect(() => yearsUntilDecline([1, 0], 0)).toThrow(RangeError);
  });
});

describe('summarizeDecline', () => {
  it('takes the median of per-replicate years (simple-statistics median when all reach it)', () => {
    const rows = [
      geometric(100, 0.5, 12),
      geometric(100, 0.3, 12),
      geometric(100, 0.7, 12),
      geometric(100, 0.6, 12),
    ];
    const perReplicate = rows.map((row) => yearsUntilDecline(row, 0.9) as number);
    const [ninety] = summarizeDecline(rows, [0.9]);
    expect(ninety.medianYears).toBe(median(perReplicate));
    expect(ninety.proportionReached).toBe(1);
  });

  it('treats "never" as later than the horizon: a number only when more than half get there', () => {
    const fast = [100, 5, 1];
    const slow = [100, 90, 80];
    // 5 replicates, 2 reach at year 1 → the middle value is "never".
    expect(summarizeDecline([fast, fast, slow, slow, slow], [0.9])[0].medianYears).toBeNull();
    // 5 replicates, 3 reach → median is year 1.
    expect(summarizeDecline([fast, fast, fast, slow, slow], [0.9])[0]).toMatchObject({
      medianYears: 1,
      proportionReached: 0.6,
    });
    // 4 replicates, exactly half reach → the mean of the middle two involves "never": null.
    expect(summarizeDecline([fast, fast, slow, slow], [0.9])[0].medianYears).toBeNull();
    // 4 replicates reaching at years 1, 2, 2 and never → (2 + 2)/2 = 2.
    const mid = [100, 50, 9];
    expect(summarizeDecline([fast, mid, mid, slow], [0.9])[0].medianYears).toBe(2);
  });

  it('reports the mean trajectory separately from the replicate median', () => {
    // Hand calculation: replicates [100, 1, 1] and [100, 100, 5]; mean trajectory [100, 50.5, 3] first
    // drops to ≤ 10 in year 2, while each replicate's own 90 % decline comes in years 1 and 2.
    const rows = [
      [100, 1, 1],
      [100, 100, 5],
    ];
    const [ninety, ninetyNine] = summarizeDecline(rows);
    expect(ninety).toEqual({ fraction: 0.9, medianYears: 1.5, meanTrajectoryYears: 2, proportionReached: 1 });
    expect(ninetyNine).toEqual({
      fraction: 0.99,
      medianYears: null,
      meanTrajectoryYears: null,
      proportionReached: 0.5,
    });
  });

  it('accepts the flat Float64Array table', () => {
    const data = Float64Array.from([100, 1, 1, 100, 100, 5]);
    expect(summarizeDecline({ data, replicateCount: 2, yearCount: 3 })).toEqual(
      summarizeDecline([
        [100, 1, 1],
        [100, 100, 5],
      ]),
    );
  });
});
