/**
 * Small dense linear systems (up to a few unknowns), for the normal equations of least-squares
 * fits. Gaussian elimination with partial pivoting (Golub & Van Loan, Matrix Computations,
 * 4th ed. 2013, §3.4).
 */

/**
 * Solve A·x = b for a square matrix A (rows given as arrays). Returns null when A is singular
 * (a pivot below 1e-300 or not finite). Example: solveLinearSystem([[2, 1], [1, 3]], [3, 5]) = [0.8, 1.4].
 */
export function solveLinearSystem(a: readonly (readonly number[])[], b: readonly number[]): number[] | null {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i]!]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r]![col]!) > Math.abs(m[pivot]![col]!)) pivot = r;
    const p = m[pivot]![col]!;
    if (!(Math.abs(p) > 1e-300) || !Number.isFinite(p)) return null;
    [m[col], m[pivot]] = [m[pivot]!, m[col]!];
    const pivotRow = m[col]!;
    for (let r = 0; r < n; r++) {
      if (r === col) continue;
      const row = m[r]!;
      const factor = row[col]! / p;
      if (factor === 0) continue;
      for (let c = col; c <= n; c++) row[c] = row[c]! - factor * pivotRow[c]!;
    }
  }
  return m.map((row, i) => row[n]! / row[i]!);
}

/**
 * Inverse of a small square matrix, column by column with solveLinearSystem; null when singular.
 * Example: invertMatrix([[2, 0], [0, 4]]) = [[0.5, 0], [0, 0.25]].
 */
export function invertMatrix(a: readonly (readonly number[])[]): number[][] | null {
  const n = a.length;
  const columns: number[][] = [];
  for (let j = 0; j < n; j++) {
    const unit = Array.from({ length: n }, (_, i) => (i === j ? 1 : 0));
    const col = solveLinearSystem(a, unit);
    if (!col) return null;
    columns.push(col);
  }
  return Array.from({ length: n }, (_, i) => columns.map((col) => col[i]!));
}
