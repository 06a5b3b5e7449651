/**
 * Records keyed by user ids (species, reactions, pools, channels, families).
 * A species may be called `__proto__` or `constructor`: on a plain object such
 * an id reads an Object.prototype member, and writing `__proto__` replaces the
 * prototype instead of storing a value. These records have no prototype, and
 * `ownValue` reads only own properties of any record (also one parsed from
 * JSON or copied between threads, which comes back with a prototype).
 */

/** A record keyed by user ids; make one with `idRecord`. */
export type IdRecord<V> = Record<string, V>;

/** A new null-prototype record, with the own entries of `from` (a record or [id, value] pairs) copied in. */
export function idRecord<V>(from?: Readonly<Record<string, V>> | Iterable<readonly [string, V]>): IdRecord<V> {
  const out: IdRecord<V> = Object.create(null);
  if (!from) return out;
  const entries = Symbol.iterator in from ? from : Object.entries(from);
  for (const [id, v] of entries as Iterable<readonly [string, V]>) out[id] = v;
  return out;
}

/** The value stored under `id` itself, never one inherited from a prototype; undefined when there is none. */
export function ownValue<V>(record: Readonly<Record<string, V>> | undefined, id: string): V | undefined {
  return record !== undefined && Object.hasOwn(record, id) ? record[id] : undefined;
}

/** Whether `id` is an own key of `record`. */
export function hasId(record: Readonly<Record<string, unknown>> | undefined, id: string): boolean {
  return record !== undefined && Object.hasOwn(record, id);
}
