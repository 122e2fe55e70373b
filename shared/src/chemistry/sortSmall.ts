/**
 * In-place insertion sort for the short lists of the hot path (a species' atoms, a centre's
 * ligands or sites): stable like Array.prototype.sort, with the same result for the same
 * comparator, but without the work buffers the built-in sort allocates on every call.
 */
export function sortSmall<T>(items: T[], compare: (a: T, b: T) => number): T[] {
  for (let i = 1; i < items.length; i++) {
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
