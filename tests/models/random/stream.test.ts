import { describe, it, expect } from 'vitest';
import { streamFor, Xoshiro128StarStar } from '../../../models/random/stream';
import { chiSquareContinuous, correlation, drawMany } from './stats';

// Independent BigInt re-implementation of the published xoshiro128** reference code
// (Blackman & Vigna 2018, xoshiro128starstar.c at prng.di.unimi.it):
//   result = rotl(s[1] * 5, 7) * 9; t = s[1] << 9;
//   s[2] ^= s[0]; s[3] ^= s[1]; s[1] ^= s[2]; s[0] ^= s[3]; s[2] ^= t; s[3] = rotl(s[3], 11);
function referenceXoshiro(seed: [number, number, number, number]): () => bigint {
  const mask = 0xffffffffn;
  const s = seed.map((w) => BigInt(w >>> 0));
  const rotl = (x: bigint, k: bigint) => ((x << k) | (x >> (32n - k))) & mask;
  return () => {
    const result = (rotl((s[1] * 5n) & mask, 7n) * 9n) & mask;
    const t = (s[1] << 9n) & mask;
    s[2] ^= s[0];
    s[3] ^= s[1];
    s[1] ^= s[2];
    s[0] ^= s[3];
    s[2] ^= t;
    s[3] = rotl(s[3], 11n);
    return result;
  };
}

const UNIFORM_CUTS = Array.from({ length: 99 }, (_, i) => (i + 1) / 100);

describe('Xoshiro128StarStar', () => {
  it('matches the reference algorithm word for word', () => {
    const seed: [number, number, number, number] = [0x12345678, 0x9abcdef0 | 0, 0x0fedcba9, 0x87654321 | 0];
    const ours = new Xoshiro128StarStar(...seed);
    const reference = referenceXoshiro(seed);
    for (let i = 0; i < 2000; i++) expect(ours.nextUint32()).toBe(Number(reference()));
  });

  it('gives 11520 first from state (1, 2, 3, 4): rotl(2·5, 7)·9 worked by hand from the reference code', () => {
    expect(new Xoshiro128StarStar(1, 2, 3, 4).nextUint32()).toBe(11520);
  });

  it('builds next() from two words as (a>>>5)·2^26 + (b>>>6) over 2^53 (the genrand_res53 construction of Matsumoto & Nishimura mt19937ar.c)', () => {
    const seed: [number, number, number, number] = [7, 11, 13, 17];
    const ours = new Xoshiro128StarStar(...seed);
    const reference = referenceXoshiro(seed);
    for (let i = 0; i < 1000; i++) {
      const a = Number(reference()) >>> 5;
      const b = Number(reference()) >>> 6;
      expect(ours.next()).toBe((a * 67108864 + b) / 9007199254740992);
    }
  });

  it('rejects the all-zero state, a fixed point of any xor-shift generator (Blackman & Vigna 2018)', () => {
    expect(() => new Xoshiro128StarStar(0, 0, 0, 0)).toThrow(RangeError);
  });
});

describe('streamFor', () => {
  it('gives the same sequence for the same (seed, path)', () => {
    const a = streamFor(20261201, 3, 7);
    const b = streamFor(20261201, 3, 7);
    for (let i = 0; i < 10_000; i++) expect(a.next()).toBe(b.next());
  });

  it('gives different sequences for different seeds or paths, including (1, 23) vs (12, 3) and () vs (0)', () => {
    const variants = [
      streamFor(1),
      streamFor(1, 0),
      streamFor(1, 1),
      streamFor(2, 0),
      streamFor(1, 23),
      streamFor(12, 3),
      streamFor(1, 0, 0),
      streamFor(-1, 0),
    ];
    const prefixes = variants.map((s) => Array.from({ length: 32 }, () => s.nextUint32()));
    for (let i = 0; i < prefixes.length; i++) {
      for (let j = i + 1; j < prefixes.length; j++) {
        // Two independent 32-bit words agree with probability 2^-32.
        const equal = prefixes[i].filter((w, k) => w === prefixes[j][k]).length;
        expect(equal).toBe(0);
      }
    }
  });

  it('gives streams whose pairwise correlation is within 5 standard errors (1/sqrt(N)) of 0', () => {
    // Standard error of Pearson's r under independence is about 1/sqrt(N) (Fisher 1915).
    const n = 20_000;
    const bound = 5 / Math.sqrt(n);
    const pairs: Array<[number[], number[]]> = [
      [
        [42, 0],
        [42, 1],
      ],
      [
        [42, 1],
        [42, 2],
      ],
      [
        [42, 0, 0],
        [42, 0, 1],
      ],
      [
        [42, 5],
        [43, 5],
      ],
      [
        [0, 0],
        [1, 0],
      ],
    ];
    for (const [[sa, ...pa], [sb, ...pb]] of pairs) {
      const a = streamFor(sa, ...pa);
      const b = streamFor(sb, ...pb);
      const xs = drawMany(n, () => a.next());
      const ys = drawMany(n, () => b.next());
      expect(Math.abs(correlation(xs, ys))).toBeLessThan(bound);
      // Lag-1 correlation within one stream, same bound.
      expect(Math.abs(correlation(xs.subarray(0, n - 1), xs.subarray(1)))).toBeLessThan(bound);
    }
  });

  it('is uniform on [0, 1): chi-square over 100 equal bins, p > 0.001 (CDF from @stdlib chi-square)', () => {
    const s = streamFor(9, 1);
    const xs = drawMany(200_000, () => s.next());
    expect(xs.every((x) => x >= 0)).toBe(true);
    expect(xs.every((x) => x < 1)).toBe(true);
    const result = chiSquareContinuous(xs, (x) => x, UNIFORM_CUTS);
    expect(result.pValue).toBeGreaterThan(0.001);
  });

  it('fills the low bits of next() (53 random bits, not 32) and of nextUint32()', () => {
    const s = streamFor(5);
    // Bits below 2^-32 of next(): uniform over 2^21 values, so a multiple of 2^-32
    // turns up with probability 2^-21 per draw.
    let withLowBits = 0;
    for (let i = 0; i < 1000; i++) if ((s.next() * 2 ** 32) % 1 !== 0) withLowBits++;
    expect(withLowBits).toBeGreaterThan(990);
    // Lowest 8 bits of nextUint32: chi-square over 256 values.
    const low = drawMany(256 * 400, () => s.nextUint32() & 0xff);
    const cuts = Array.from({ length: 255 }, (_, i) => i + 1);
    expect(chiSquareContinuous(low, (x) => x / 256, cuts).pValue).toBeGreaterThan(0.001);
  });

  it('returns integers in [0, 2^32) from nextUint32', () => {
    const s = streamFor(77, 1, 2, 3);
    const words = drawMany(100_000, () => s.nextUint32());
    expect(words.every((w) => Number.isInteger(w) && w >= 0 && w < 2 ** 32)).toBe(true);
    const max = words.reduce((a, b) => Math.max(a, b), 0);
    // The top bit is set half the time, so the largest of 1e5 words is near 2^32.
    expect(max).toBeGreaterThan(2 ** 31);
  });

  it('rejects seeds and path entries that are not safe integers', () => {
    expect(() => streamFor(1.5)).toThrow(RangeError);
    expect(() => streamFor(Number.NaN)).toThrow(RangeError);
    expect(() => streamFor(2 ** 53)).toThrow(RangeError);
    expect(() => streamFor(1, 0.5)).toThrow(RangeError);
    expect(() => streamFor(1, 0, Infinity)).toThrow(RangeError);
  });
});
