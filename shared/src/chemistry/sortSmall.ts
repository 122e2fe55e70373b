/**
 * In-place insertion sort for the short lists of the hot path (a species' atoms, a centre's
 * ligands or sites): stable like Array.prototype.sort, with the same result for the same
 * comparator, but without the work buffers the built-in sort allocates on every call.
 */
export function sortSmall<T>(items: T[], compare: (a: T, b: T) => number, count?: number): T[];
/** The same for the first `count` numbers of a typed array (the Lewis search's atom orders). */
export function sortSmall(items: Int32Array, compare: (a: number, b: number) => number, count?: number): Int32Array;
export function sortSmall<T>(
  items: { [index: number]: T; readonly length: number },
  compare: (a: T, b: T) => number,
  count = items.length,
) {
  for (let i = 1; i < count; i++) {
    const item = items[i];
    let j = i - 1;
    while (j >= 0 && compare(items[j], item) > 0) {
      items[j + 1] = items[j];
      j--;
    }
    items[j + 1] = item;
  }
  return items;
}

/** Plain code-unit order of strings, the order of Array.prototype.sort without a comparator. */
export function compareCodeUnits(a: string, b: string): number {
  return a < b ? -1 : a > b ? 1 : 0;
}
