/**
 * A row's value in one of a group's columns (season, player, level, age, z ...), checked: a row
 * outside the column is a programming error, so it throws instead of reading `undefined` as a number.
 *
 * @example
 * valueAt(g.season, row); // => 2024
 */
export function valueAt(column: ArrayLike<number>, index: number): number {
  const v = column[index];
  if (v === undefined) throw new RangeError(`internal: index ${index} outside a column of ${column.length}`);
  return v;
}
