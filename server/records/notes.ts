// How an estimate is named in a parameter's source note: which upload (by file name and
// the start of its SHA-256), what was estimated, and where to find the records page.
import type { SourceRef } from '../../shared/api/records';

/** The first 12 hex digits identify the file among a field's uploads; the full checksum is on the records page. */
export const shortSha = (sha256: string) => `${sha256.slice(0, 12)}…`;

const SHOWN = 3;

/** "upload a.csv (sha256 1a2b…)" or "uploads a.csv (sha256 …), b.csv (sha256 …) and 2 more". */
export function uploadsPhrase(sources: readonly SourceRef[]): string {
  const named = sources.slice(0, SHOWN).map((s) => `${s.filename} (sha256 ${shortSha(s.sha256)})`);
  const more = sources.length > SHOWN ? ` and ${sources.length - SHOWN} more` : '';
  return `${sources.length === 1 ? 'upload' : 'uploads'} ${named.join(', ')}${more}`;
}

export const sourceNote = (sources: readonly SourceRef[], what: string, recordsPath: string) =>
  `From ${uploadsPhrase(sources)}, ${what}. Records: ${recordsPath}`;

/** A percentage to whole numbers, or one decimal below 10. */
export const pct = (x: number) => (Math.abs(x) >= 10 ? x.toFixed(0) : x.toFixed(1));

/** "87 ± 6": mean and spread to the same decimals, whole numbers unless the spread is below 1. */
export function plusMinus(mean: number, spread: number): string {
  const decimals = spread < 1 ? 1 : 0;
  return `${mean.toFixed(decimals)} ± ${spread.toFixed(decimals)}`;
}

/** "1,610–2,050", or "−28 to 44" when the lower end is negative (a dash would read as a minus). */
export function range(lower: string, upper: string): string {
  return lower.startsWith('-')
    ? `${lower.replace('-', '−')} to ${upper.replace('-', '−')}`
    : `${lower}–${upper}`;
}

export const ci = (confidence: number) => `${Math.round(confidence * 100)} %`;
