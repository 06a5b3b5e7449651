/**
 * A small least-recently-used map: the explorer keeps the results of the
 * last few conditions, so that stepping back to one of them repaints at once
 * without asking the server. Reading an entry makes it the newest; adding one
 * beyond the capacity drops the oldest.
 */

export const RECENT_CACHE_DEFAULTS = {
  /** entries kept; default 24 */
  capacity: 24,
};

export interface RecentCache<T> {
  get(key: string): T | undefined;
  set(key: string, value: T): void;
  /** keys, oldest first */
  keys(): string[];
}

export function recentCache<T>(options: Partial<typeof RECENT_CACHE_DEFAULTS> = {}): RecentCache<T> {
  const { capacity } = { ...RECENT_CACHE_DEFAULTS, ...options };
  if (!Number.isInteger(capacity) || capacity < 1)
    throw new RangeError(`recentCache: invalid capacity: ${capacity} (expected a whole number ≥ 1)`);
  const map = new Map<string, T>();
  return {
    get(key) {
      const v = map.get(key);
      if (v !== undefined) {
        map.delete(key);
        map.set(key, v);
      }
      return v;
    },
    set(key, value) {
      map.delete(key);
      map.set(key, value);
      while (map.size > capacity) map.delete(map.keys().next().value as string);
    },
    keys: () => [...map.keys()],
  };
}
