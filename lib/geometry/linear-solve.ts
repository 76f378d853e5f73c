/** Solves A·x = b by Gaussian elimination with partial pivoting (Golub & Van Loan, Matrix Computations, §3.4). */
export function solveLinearSystem(a: readonly (readonly number[])[], b: readonly number[]): number[] {
  const n = b.length;
  const m = a.map((row, i) => [...row, b[i] as number]);
  for (let col = 0; col < n; col++) {
    let pivot = col;
    for (let r = col + 1; r < n; r++) if (Math.abs(m[r]![col]!) > Math.abs(m[pivot]![col]!)) pivot = r;
    const pivotRow = m[pivot]!;
    if (Math.abs(pivotRow[col]!) < 1e-14) throw new Error("singular system");
    [m[col], m[pivot]] = [pivotRow, m[col]!];
    for (let r = col + 1; r < n; r++) {
      const row = m[r]!;
      const f = row[col]! / pivotRow[col]!;
      for (let c = col; c <= n; c++) row[c] = row[c]! - f * pivotRow[c]!;
    }
  }
  const x = new Array<number>(n).fill(0);
  for (let r = n - 1; r >= 0; r--) {
    const row = m[r]!;
    let s = row[n]!;
    for (let c = r + 1; c < n; c++) s -= row[c]! * x[c]!;
    x[r] = s / row[r]!;
  }
  return x;
}
