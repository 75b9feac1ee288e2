/**
 * One problem found in a list of field records. `index` is the 0-based position of the offending
 * record in the array the estimator was given (null when the problem is the data set as a whole, e.g.
 * a missing untreated check), so an upload preview can put the message on the right row.
 */
export interface RecordIssue {
  index: number | null;
  message: string;
}

/** How many issues the error's own message spells out; all of them stay in `issues`. */
const SHOWN = 5;

/**
 * Thrown by the estimators when the records cannot be analysed. All problems are collected before
 * throwing, because a person fixing a file wants the whole list at once, not one per upload.
 */
export class RecordsError extends Error {
  readonly issues: readonly RecordIssue[];

  constructor(context: string, issues: readonly RecordIssue[]) {
    const shown = issues
      .slice(0, SHOWN)
      .map((issue) => (issue.index === null ? issue.message : `record ${issue.index + 1}: ${issue.message}`));
    const more = issues.length > SHOWN ? `; and ${issues.length - SHOWN} more` : '';
    super(`${context}: ${shown.join('; ')}${more}`);
    this.name = 'RecordsError';
    this.issues = issues;
  }
}
