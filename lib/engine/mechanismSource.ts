/**
 * Where a compiled mechanism comes from: a built-in document, or the text of
 * an uploaded one (content-addressed, so caching by id is safe).
 */
import { loadBuiltinMechanism, loadMechanism } from "../mechanism";
import type { CompiledMechanism } from "../mechanism/types";

export interface MechanismSource {
  id: string;
  title: string;
  /** document text for an upload; absent for a built-in */
  text?: string;
}

const MAX_CACHED = 32;
const cache = new Map<string, CompiledMechanism>();

export function compileSource(src: MechanismSource): CompiledMechanism {
  const hit = cache.get(src.id);
  if (hit) return hit;
  const mech = src.text === undefined ? loadBuiltinMechanism(src.id).mechanism : loadMechanism(src.text).mechanism;
  if (cache.size >= MAX_CACHED) cache.delete(cache.keys().next().value as string);
  cache.set(src.id, mech);
  return mech;
}
