/**
 * The null space of a rational matrix, exactly: reduced row echelon form by Gauss-Jordan
 * elimination over fractions, then one basis vector per free column.
 */
import { divide, fraction, isZero, multiply, negate, ONE, subtract, ZERO, type Fraction } from "./rational";

/**
 * A basis of { x : matrix · x = 0 }, one vector per free column (each with a 1 in its own free
 * column). An empty array when only the zero vector solves it.
 */
export function nullSpace(matrix: readonly (readonly bigint[])[], columns: number): Fraction[][] {
  const rows: Fraction[][] = matrix.map((row) => Array.from({ length: columns }, (_, column) => fraction(row[column] ?? 0n)));
  const pivotColumns: number[] = [];
  let pivotRow = 0;
  for (let column = 0; column < columns && pivotRow < rows.length; column++) {
    const found = rows.findIndex((row, index) => index >= pivotRow && !isZero(row[column]));
    if (found < 0) continue;
    [rows[pivotRow], rows[found]] = [rows[found], rows[pivotRow]];
    const pivot = rows[pivotRow][column];
    rows[pivotRow] = rows[pivotRow].map((value) => divide(value, pivot));
    for (let other = 0; other < rows.length; other++) {
      if (other === pivotRow || isZero(rows[other][column])) continue;
      const factor = rows[other][column];
      rows[other] = rows[other].map((value, index) => subtract(value, multiply(factor, rows[pivotRow][index])));
    }
    pivotColumns.push(column);
    pivotRow++;
  }
  const basis: Fraction[][] = [];
  for (let free = 0; free < columns; free++) {
    if (pivotColumns.includes(free)) continue;
    const vector: Fraction[] = Array.from({ length: columns }, () => ZERO);
    vector[free] = ONE;
    pivotColumns.forEach((pivotColumn, row) => {
      vector[pivotColumn] = negate(rows[row][free]);
    });
    basis.push(vector);
  }
  return basis;
}
