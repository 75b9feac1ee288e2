import tQuantile from '@stdlib/stats-base-dists-t-quantile';
import { binomialInterval, type BinomialMethod, type Proportion } from './binomial-interval';
import { checkCount, checkLabel, requireConfidence } from './checks';
import { RecordsError, type RecordIssue } from './records-error';

/** One count of a germination test: the running total germinated in one dish on one day. */
export interface GerminationRecord {
  /** One dish (or one replicate of seeds) followed over time. */
  testId: string;
  temperatureC: number;
  seeds: number;
  /** Days since the seeds were set to germinate (day 0 = sowing). */
  day: number;
  cumulativeGerminated: number;
}

export interface GerminationTest {
  testId: string;
  temperatureC: number;
  seeds: number;
  lastDay: number;
  fraction: Proportion;
  /** Days to half of this dish's final count; null when nothing germinated. */
  t50Days: number | null;
}

export interface TemperatureGermination {
  temperatureC: number;
  tests: number;
  /** Seeds and germinated pooled over the dishes at this temperature. */
  fraction: Proportion;
  /** Null when no dish at this temperature germinated. */
  t50Days: T50Summary | null;
}

/**
 * Mean T50 over the dishes that germinated, with a t interval across dishes (n − 1 df). The limits
 * are null when only one dish germinated: one dish shows no spread, and a zero-width interval would
 * claim a precision the test does not have.
 */
export interface T50Summary {
  meanDays: number;
  lower: number | null;
  upper: number | null;
  confidence: number;
  dishes: number;
}

export interface GerminationAnalysis {
  tests: GerminationTest[];
  /** Ascending temperature. */
  temperatures: TemperatureGermination[];
  /**
   * The tested temperature with the highest pooled final fraction; among equal fractions the one
   * with the shorter mean T50, then the lower temperature. `tiedTemperaturesC` lists every
   * temperature sharing the highest fraction (ascending). Null when no seed germinated anywhere.
   */
  best: { temperatureC: number; tiedTemperaturesC: number[] } | null;
}

export interface GerminationOptions {
  method?: BinomialMethod;
  confidence?: number;
}

/**
 * Final germination fraction per dish and per temperature, time to 50 % germination, and the best
 * temperature tested.
 *
 * T50 follows Coolbear, Francis & Grierson (1984, J. Exp. Bot. 35:1609–1617):
 *     T50 = tᵢ + (N/2 − nᵢ)(tⱼ − tᵢ) / (nⱼ − nᵢ)
 * where N is the dish's final count and nᵢ < N/2 ≤ nⱼ are the cumulative counts on the adjacent count
 * days tᵢ < tⱼ — linear interpolation between the counts that bracket half of the final number (not
 * half of the seeds sown, so T50 speaks of speed, separately from the final fraction). A dish with no
 * count on day 0 is taken to start at 0 germinated on day 0.
 *
 * Validation: one temperature and one number of seeds per dish, one count per day, counts whole,
 * never decreasing with time and never above the seeds in the dish.
 */
export function analyseGermination(
  records: readonly GerminationRecord[],
  options: GerminationOptions = {},
): GerminationAnalysis {
  const method = options.method ?? 'wilson';
  const confidence = options.confidence ?? 0.95;
  requireConfidence(confidence);
  const dishes = validate(records);

  const tests: GerminationTest[] = [...dishes].map(([testId, dish]) => {
    const last = dish.counts[dish.counts.length - 1];
    return {
      testId,
      temperatureC: dish.temperatureC,
      seeds: dish.seeds,
      lastDay: last.day,
      fraction: binomialInterval(last.germinated, dish.seeds, method, confidence),
      t50Days: t50(dish.counts),
    };
  });

  const temperatures = [...new Set(tests.map((t) => t.temperatureC))]
    .sort((a, b) => a - b)
    .map((temperatureC): TemperatureGermination => {
      const here = tests.filter((t) => t.temperatureC === temperatureC);
      const seeds = here.reduce((sum, t) => sum + t.seeds, 0);
      const germinated = here.reduce((sum, t) => sum + t.fraction.successes, 0);
      const t50s = here.map((t) => t.t50Days).filter((t): t is number => t !== null);
      return {
        temperatureC,
        tests: here.length,
        fraction: binomialInterval(germinated, seeds, method, confidence),
        t50Days: meanInterval(t50s, confidence),
      };
    });

  return { tests, temperatures, best: bestTemperature(temperatures) };
}

interface Dish {
  temperatureC: number;
  seeds: number;
  counts: { day: number; germinated: number; index: number }[];
}

function validate(records: readonly GerminationRecord[]): Map<string, Dish> {
  const issues: RecordIssue[] = [];
  if (records.length === 0) issues.push({ index: null, message: 'no germination counts were given' });
  const dishes = new Map<string, Dish>();
  records.forEach((r, index) => {
    const ok = [
      checkLabel(issues, index, r.testId, 'test id'),
      checkCount(issues, index, r.seeds, 'seeds per dish'),
      checkCount(issues, index, r.cumulativeGerminated, 'cumulative germinated'),
    ].every(Boolean);
    if (!(typeof r.temperatureC === 'number' && Number.isFinite(r.temperatureC))) {
      issues.push({ index, message: `temperature (°C) must be a number, got ${String(r.temperatureC)}` });
      return;
    }
    if (!(typeof r.day === 'number' && Number.isFinite(r.day) && r.day >= 0)) {
      issues.push({ index, message: `day must be a number ≥ 0, got ${String(r.day)}` });
      return;
    }
    if (!ok) return;
    const id = r.testId.trim();
    if (r.seeds === 0) {
      issues.push({ index, message: `test ${id}: seeds per dish must be at least 1` });
      return;
    }
    if (r.cumulativeGerminated > r.seeds) {
      issues.push({
        index,
        message: `test ${id}, day ${r.day}: ${r.cumulativeGerminated} germinated exceeds the ${r.seeds} seeds in the dish`,
      });
    }
    const dish = dishes.get(id);
    if (!dish) {
      dishes.set(id, {
        temperatureC: r.temperatureC,
        seeds: r.seeds,
        counts: [{ day: r.day, germinated: r.cumulativeGerminated, index }],
      });
      return;
    }
    if (dish.temperatureC !== r.temperatureC) {
      issues.push({
        index,
        message: `test ${id} is at ${r.temperatureC} °C here but ${dish.temperatureC} °C elsewhere`,
      });
    }
    if (dish.seeds !== r.seeds) {
      issues.push({ index, message: `test ${id} has ${r.seeds} seeds here but ${dish.seeds} elsewhere` });
    }
    if (dish.counts.some((c) => c.day === r.day)) {
      issues.push({ index, message: `test ${id} has two counts on day ${r.day}` });
    }
    dish.counts.push({ day: r.day, germinated: r.cumulativeGerminated, index });
  });
  for (const [id, dish] of dishes) {
    dish.counts.sort((a, b) => a.day - b.day);
    for (let i = 1; i < dish.counts.length; i++) {
      const before = dish.counts[i - 1];
      const now = dish.counts[i];
      if (now.germinated < before.germinated) {
        issues.push({
          index: now.index,
          message: `test ${id}: cumulative germinated falls from ${before.germinated} on day ${before.day} to ${now.germinated} on day ${now.day}`,
        });
      }
    }
  }
  if (issues.length > 0) throw new RecordsError('germination tests', issues);
  return dishes;
}

/** Coolbear et al. (1984) interpolation; see `analyseGermination`. */
function t50(counts: readonly { day: number; germinated: number }[]): number | null {
  const final = counts[counts.length - 1].germinated;
  if (final === 0) return null;
  const half = final / 2;
  const series = counts[0].day > 0 ? [{ day: 0, germinated: 0 }, ...counts] : counts;
  const j = series.findIndex((c) => c.germinated >= half);
  if (j === 0) return series[0].day;
  const a = series[j - 1];
  const b = series[j];
  return a.day + ((half - a.germinated) * (b.day - a.day)) / (b.germinated - a.germinated);
}

function meanInterval(values: readonly number[], confidence: number): T50Summary | null {
  const n = values.length;
  if (n === 0) return null;
  const mean = values.reduce((sum, v) => sum + v, 0) / n;
  if (n === 1) return { meanDays: mean, lower: null, upper: null, confidence, dishes: 1 };
  const variance = values.reduce((sum, v) => sum + (v - mean) ** 2, 0) / (n - 1);
  const half = tQuantile(1 - (1 - confidence) / 2, n - 1) * Math.sqrt(variance / n);
  return { meanDays: mean, lower: mean - half, upper: mean + half, confidence, dishes: n };
}

function bestTemperature(temperatures: readonly TemperatureGermination[]): GerminationAnalysis['best'] {
  // Fractions compared by cross-multiplying whole numbers, so 30/40 and 15/20 tie exactly.
  const higher = (a: Proportion, b: Proportion): number => a.successes * b.trials - b.successes * a.trials;
  const top = temperatures.reduce((best, t) => (higher(t.fraction, best.fraction) > 0 ? t : best));
  if (top.fraction.successes === 0) return null;
  const tied = temperatures.filter((t) => higher(t.fraction, top.fraction) === 0);
  const speed = (t: TemperatureGermination): number => t.t50Days?.meanDays ?? Number.POSITIVE_INFINITY;
  const chosen = [...tied].sort((a, b) => speed(a) - speed(b) || a.temperatureC - b.temperatureC)[0];
  return { temperatureC: chosen.temperatureC, tiedTemperaturesC: tied.map((t) => t.temperatureC) };
}
