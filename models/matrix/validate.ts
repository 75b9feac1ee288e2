/**
 * Input checks for a projection matrix A, where A[i][j] is the contribution of stage j in year t to
 * stage i in year t+1. Rejecting bad input here, with the offending row/column named, keeps the
 * eigen-solvers free of guards and gives the UI a message a user can act on.
 * Indices in messages are 0-based, as in the code that builds the matrix.
 */
export function assertProjectionMatrix(matrix: readonly (readonly number[])[]): void {
  if (!Array.isArray(matrix) || matrix.length === 0) {
    throw new RangeError('projection matrix must have at least one row (at least 1×1)');
  }
  const n = matrix.length;
  for (let i = 0; i < n; i++) {
    const row = matrix[i];
    if (!Array.isArray(row)) {
      throw new RangeError(`projection matrix row ${i} is not an array`);
    }
    if (row.length !== n) {
      throw new RangeError(
        `projection matrix must be square: row ${i} has ${row.length} entries but there are ${n} rows`,
      );
    }
    for (let j = 0; j < n; j++) {
      const a = row[j];
      if (typeof a !== 'number' || !Number.isFinite(a)) {
        throw new RangeError(
          `projection matrix entry at row ${i}, column ${j} is ${String(a)}; it must be a finite number`,
        );
      }
      if (a < 0) {
        throw new RangeError(
          `projection matrix entry at row ${i}, column ${j} is ${a}; entries must be non-negative`,
        );
      }
    }
  }
}
