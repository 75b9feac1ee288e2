import type { RecordIssue } from './records-error';

/** A two-sided confidence level must leave some probability in each tail. */
export function requireConfidence(confidence: number): void {
  if (!(confidence > 0 && confidence < 1)) {
    throw new RangeError(`confidence level must be strictly between 0 and 1 (e.g. 0.95), got ${confidence}`);
  }
}

/** A significance level for a test, e.g. 0.05. */
export function requireAlpha(alpha: number, what: string): void {
  if (!(alpha > 0 && alpha < 1)) {
    throw new RangeError(`${what} must be strictly between 0 and 1 (e.g. 0.05), got ${alpha}`);
  }
}

/**
 * Pushes an issue unless `value` is a whole number ≥ 0 (seeds, plants, cores are counted, not
 * measured). Returns whether the value passed, so callers can skip checks that depend on it.
 */
export function checkCount(
  issues: RecordIssue[],
  index: number,
  value: unknown,
  what: string,
): value is number {
  if (typeof value !== 'number' || !Number.isInteger(value)) {
    issues.push({ index, message: `${what} must be a whole number, got ${String(value)}` });
    return false;
  }
  if (value < 0) {
    issues.push({ index, message: `${what} must not be negative, got ${value}` });
    return false;
  }
  return true;
}

/** Pushes an issue unless `value` is a finite number > 0 (diameters, areas). */
export function checkPositive(
  issues: RecordIssue[],
  index: number,
  value: unknown,
  what: string,
): value is number {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    issues.push({ index, message: `${what} must be a number greater than 0, got ${String(value)}` });
    return false;
  }
  return true;
}

/** Pushes an issue unless `value` is a non-empty label (after trimming). */
export function checkLabel(
  issues: RecordIssue[],
  index: number,
  value: unknown,
  what: string,
): value is string {
  if (typeof value !== 'string' || value.trim() === '') {
    issues.push({ index, message: `${what} must be a non-empty text, got ${JSON.stringify(value)}` });
    return false;
  }
  return true;
}
