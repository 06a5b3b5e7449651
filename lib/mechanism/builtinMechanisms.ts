/**
 * The built-in mechanism documents, lib/mechanisms/<id>.yaml, read with
 * node:fs from the working directory and compiled once per process, or
 * taken as a bundle stored them (prebuiltMechanisms.ts).
 */
import fs from "node:fs";
import path from "node:path";
import { EngineError } from "../errors";
import { idRecord } from "../idRecord";
import { BUILTIN_MECHANISMS } from "../mechanisms";
import { loadMechanism } from "./loadMechanism";
import { prebuiltMechanisms } from "./prebuiltMechanisms";
import type { BuiltinMechanismInfo, LoadedMechanism } from "./types";

const cache = new Map<string, LoadedMechanism>();
const prebuilt = prebuiltMechanisms() as Record<string, LoadedMechanism> | undefined;

/** A loaded mechanism from its JSON form (JSON.stringify of a LoadedMechanism, parsed): the species index keyed by id again. */
export function reviveLoadedMechanism(data: LoadedMechanism): LoadedMechanism {
  const speciesIndex = idRecord<number>(data.mechanism.speciesIndex);
  return { ...data, mechanism: { ...data.mechanism, speciesIndex } };
}

/** Id, title and description of every built-in mechanism. */
export function builtinMechanisms(): BuiltinMechanismInfo[] {
  return BUILTIN_MECHANISMS.map((m) => ({ ...m }));
}

/** Folder of the built-in documents. */
export function builtinMechanismDir(): string {
  return path.join(process.cwd(), "lib", "mechanisms");
}

/** Loads (and caches) a built-in mechanism; unknown id → EngineError "unknown-mechanism". */
export function loadBuiltinMechanism(id: string): LoadedMechanism {
  const hit = cache.get(id);
  if (hit) return hit;
  if (!BUILTIN_MECHANISMS.some((m) => m.id === id)) {
    throw new EngineError(
      "unknown-mechanism",
      `unknown mechanism "${id}"; the built-in mechanisms are ${BUILTIN_MECHANISMS.map((m) => m.id).join(", ")}`,
      { path: "mechanismId" },
    );
  }
  const stored = prebuilt?.[id];
  const loaded = stored
    ? reviveLoadedMechanism(stored)
    : loadMechanism(fs.readFileSync(path.join(builtinMechanismDir(), `${id}.yaml`), "utf8"), { format: "yaml" });
  cache.set(id, loaded);
  return loaded;
}
