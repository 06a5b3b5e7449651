/**
 * The built-in mechanism documents, lib/mechanisms/<id>.yaml, read with
 * node:fs from the working directory and compiled once per process.
 */
import fs from "node:fs";
import path from "node:path";
import { EngineError } from "../errors";
import { BUILTIN_MECHANISMS } from "../mechanisms";
import { loadMechanism } from "./loadMechanism";
import type { BuiltinMechanismInfo, LoadedMechanism } from "./types";

const cache = new Map<string, LoadedMechanism>();

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
  const text = fs.readFileSync(path.join(builtinMechanismDir(), `${id}.yaml`), "utf8");
  const loaded = loadMechanism(text, { format: "yaml" });
  cache.set(id, loaded);
  return loaded;
}
