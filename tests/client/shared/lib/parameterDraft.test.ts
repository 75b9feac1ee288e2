import { describe, expect, it } from 'vitest';
import {
  parseTyped,
  readNumber,
  shownText,
  typedDraft,
} from '../../../../client/src/shared/lib/parameterDraft';
import { numberField } from '../../../../shared/scenario/fields';

// Exact factors (NIST SP 811, 2008, Appendix B.8): 1 ft² = 0.09290304 m²; 1 acre = 4046.8564224 m².

describe('numbers typed in US customary units', () => {
  it('reads 92.90304 seeds/ft² as 1000 seeds/m²', () => {
    const read = readNumber('field.initialSeedbank.shallow', typedDraft('92.90304', 'us'));
    expect(read.error).toBeUndefined();
    expect(read.value).toBeCloseTo(1000, 9);
  });

  it('reads an area of 1 acre as 0.40468564224 ha', () => {
    expect(readNumber('field.areaHa', typedDraft('1', 'us')).value).toBeCloseTo(0.40468564224, 12);
  });

  it('reads a cost of 100 per acre as 247.105… per ha (100 / 0.40468564224)', () => {
    expect(readNumber('strategy.steps[].cost.material', typedDraft('100', 'us')).value).toBeCloseTo(
      100 / 0.40468564224,
      9,
    );
  });

  it('shows a metric value converted once the units switch, and the typed text when they do not', () => {
    expect(shownText('field.initialSeedbank.deep', typedDraft('1000', 'metric'), 'us')).toBe('92.903');
    expect(shownText('field.initialSeedbank.deep', typedDraft('10OO', 'metric'), 'us')).toBe('10OO');
    expect(shownText('profile.seedDecay.shallow', typedDraft('0.12', 'metric'), 'us')).toBe('0.12');
  });
});

describe('what is refused, beside the field', () => {
  it('refuses a fraction above 1, in the words the server uses', () => {
    // A fraction (a probability) lies in 0–1 (common practice, no published source); the
    // message must be the one the server's schema gives, so both read the same beside the field.
    const server = numberField('strategy.steps[].efficacy.mean').safeParse(1.4);
    expect(server.success).toBe(false);
    const message = readNumber('strategy.steps[].efficacy.mean', typedDraft('1.4', 'metric')).error;
    expect(message).toBe(server.error?.issues[0].message);
    expect(message).toContain('0–1');
  });

  it('states the limit in the units typed', () => {
    // 1,000,000 seeds/m² × 0.09290304 m²/ft² = 92,903.04 seeds/ft².
    expect(readNumber('field.initialSeedbank.shallow', typedDraft('100000', 'us')).error).toBe(
      '100000 is outside 0–92,903.04 (seeds/ft²)',
    );
  });

  it('refuses text that is not a number, and a blank unless optional', () => {
    expect(readNumber('profile.seedDecay.deep', typedDraft('abc', 'metric')).error).toMatch(
      /is not a number/,
    );
    expect(readNumber('profile.seedDecay.deep', typedDraft(' ', 'metric')).error).toMatch(/is required/);
    expect(readNumber('profile.fecundity.aggregation', typedDraft('', 'metric'), true)).toEqual({
      value: undefined,
    });
  });

  it('accepts thousands separators but not a decimal comma', () => {
    expect(parseTyped('60,000')).toBe(60000);
    expect(parseTyped('1,5')).toBeNaN();
  });
});
