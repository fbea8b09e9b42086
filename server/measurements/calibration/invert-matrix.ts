/** Inverse of a small square matrix. */

/**
 * The inverse of `a` (n×n, row-major) by Gauss–Jordan elimination with partial pivoting (Press et
 * al., Numerical Recipes, 3rd ed., §2.1); null when a pivot is below 1e-14 of the largest entry
 * (singular or nearly so). For the few-parameter normal matrices of a calibration.
 */
export function invertMatrix(a: readonly (readonly number[])[]): number[][] | null {
  const n = a.length;
  const m = a.map((row, i) => [
    ...row.slice(0, n),
    ...Array.from({ length: n }, (_, j) => (i === j ? 1 : 0)),
  ]);
  const scale = Math.max(...a.flatMap((row) => row.map(Math.abs)), 0);
  if (scale === 0) return null;
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++)
      if (Math.abs(m[r]?.[col] ?? 0) > Math.abs(m[pivot]?.[col] ?? 0)) pivot = r;
    const pivotRow = m[pivot];
    const here = m[col];
    if (!pivotRow || !here || Math.abs(pivotRow[col] ?? 0) < 1e-14 * scale) return null;
    m[pivot] = here;
    m[col] = pivotRow;
    const p = pivotRow[col] ?? 1;
    for (let k = 0; k < 2 * n; k++) pivotRow[k] = (pivotRow[k] ?? 0) / p;
    for (let r = 0; r < n; r++) {
      const row = m[r];
      if (r === col || !row) continue;
      const factor = row[col] ?? 0;
      for (let k = 0; k < 2 * n; k++) row[k] = (row[k] ?? 0) - factor * (pivotRow[k] ?? 0);
    }
  }
  return m.map((row) => row.slice(n));
}
