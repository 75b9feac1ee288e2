import { describe, it, expect } from 'vitest';
import { lgamma } from 'mathjs';
import { logFactorial } from '../../../models/random/logfactorial';

describe('logFactorial', () => {
  it('is exact for small k: log 0! = log 1! = 0, log 5! = log 120 (definition of the factorial)', () => {
    expect(logFactorial(0)).toBe(0);
    expect(logFactorial(1)).toBe(0);
    expect(logFactorial(5)).toBeCloseTo(Math.log(120), 14);
  });

  it('agrees with the definition log k! = Σ log i to 1e-13 relative, on both sides of the table', () => {
    // The running sum is the definition itself; its own rounding stays below ~k ulps.
    let sum = 0;
    for (let k = 2; k <= 20_000; k++) {
      sum += Math.log(k);
      if (k < 300 || k % 997 === 0) expect(Math.abs(logFactorial(k) - sum)).toBeLessThanOrEqual(1e-13 * sum);
    }
  });

  it('agrees with mathjs lgamma(k + 1) to 1e-13 relative for large k', () => {
    for (const k of [1e5, 1e6, 1e9, 1e12, 1e15]) {
      const reference = lgamma(k + 1);
      expect(Math.abs(logFactorial(k) - reference)).toBeLessThanOrEqual(1e-13 * reference);
    }
  });
});
