/**
 * A second place for the diffuse fields of radiativeColumn.ts to live, behind
 * its in-memory cache: a process that starts often and solves the same
 * columns each time (the command line) sets one that keeps them on disk, so a
 * second run at the same sun reads its field instead of solving the column.
 * The service and the tests set none. A store holds exactly the numbers the
 * solver gave (a field's flux is a Float32Array, stored as its bytes), so a
 * field read back gives the results a solved one gives; the store's owner
 * keys it on the engine's sources, so that a changed solver never reads an
 * old field.
 */
/** The diffuse actinic flux on a column's interfaces (radiativeColumn.ts solves it). */
export interface DiffuseField {
  /** interface altitudes, km, top first (the first is the top of the atmosphere, +∞) */
  z_km: Float64Array;
  /** first bin of the grid with diffuse light */
  firstBin: number;
  /** number of bins with diffuse light (firstBin … firstBin + bins − 1) */
  bins: number;
  /** diffuse actinic flux, photons cm⁻² s⁻¹ per bin, at [interface·bins + bin − firstBin] */
  flux: Float32Array;
  /** false when no interface sees the sun (all zero) */
  sunlit: boolean;
}

export interface DiffuseFieldStore {
  /** the field stored under `key`, or undefined */
  get(key: string): DiffuseField | undefined;
  /** keeps `field` under `key` (a store that cannot keep it drops it) */
  put(key: string, field: DiffuseField): void;
}

let current: DiffuseFieldStore | undefined;

/** Sets the store behind the in-memory cache of diffuse fields (undefined: none, the default). */
export function setDiffuseFieldStore(store: DiffuseFieldStore | undefined): void {
  current = store;
}

/** The store set by setDiffuseFieldStore, if any. */
export function diffuseFieldStore(): DiffuseFieldStore | undefined {
  return current;
}
