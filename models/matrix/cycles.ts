/**
 * Whether the life-cycle graph of a non-negative matrix (edge j → i when A[i][j] > 0) contains a
 * loop. A non-negative matrix has spectral radius 0 exactly when it is nilpotent, i.e. when its graph
 * is acyclic (every individual's line dies out within n years). Deciding this on the graph is exact,
 * whereas a floating-point eigenvalue solver returns tiny non-zero roots for nilpotent matrices.
 * Kahn's topological sort: the graph is acyclic iff every node can be peeled off with in-degree 0.
 */
export function hasLifeCycleLoop(matrix: readonly (readonly number[])[]): boolean {
  const n = matrix.length;
  const inDegree = new Int32Array(n);
  for (let i = 0; i < n; i++) {
    for (let j = 0; j < n; j++) {
      if (matrix[i][j] > 0) inDegree[i]++;
    }
  }
  const ready: number[] = [];
  for (let i = 0; i < n; i++) if (inDegree[i] === 0) ready.push(i);
  let removed = 0;
  while (ready.length > 0) {
    const j = ready.pop() as number;
    removed++;
    for (let i = 0; i < n; i++) {
      if (matrix[i][j] > 0 && --inDegree[i] === 0) ready.push(i);
    }
  }
  return removed < n;
}
