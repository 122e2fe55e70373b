/**
 * A memo that forgets its least recently useful entries in constant time: entries live in a young
 * and an old generation; when the young one is full it becomes the old one and the old one is
 * dropped, and an entry found in the old generation moves back to the young one. (Evicting the
 * first key of one big Map, entry by entry, gets slow: each eviction scans the holes left by the
 * ones before.)
 */
export interface BoundedMemo<V> {
  get(key: string): V | undefined;
  set(key: string, value: V): void;
}

/**
 * Holds at most about `budget` units, where each entry weighs `weight(key, value)` units (1 by
 * default: a count of entries).
 */
export function boundedMemo<V>(budget: number, weight: (key: string, value: V) => number = () => 1): BoundedMemo<V> {
  const generationBudget = Math.max(budget / 2, 1);
  let young = new Map<string, V>();
  let old = new Map<string, V>();
  let youngWeight = 0;
  const set = (key: string, value: V): void => {
    const heavy = weight(key, value);
    if (youngWeight + heavy > generationBudget && young.size > 0) {
      old = young;
      young = new Map();
      youngWeight = 0;
    }
    young.set(key, value);
    youngWeight += heavy;
  };
  return {
    get(key) {
      const found = young.get(key);
      if (found !== undefined) return found;
      const older = old.get(key);
      if (older !== undefined) {
        old.delete(key);
        set(key, older);
      }
      return older;
    },
    set(key, value) {
      if (young.has(key)) return;
      set(key, value);
    },
  };
}
