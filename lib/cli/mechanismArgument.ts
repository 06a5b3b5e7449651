/**
 * A mechanism named on the command line: a built-in id, or a document file
 * (YAML or JSON) that is loaded and content-addressed as an upload is, so its
 * results carry the same mechanism id as the service would give it.
 */
import path from "node:path";
import type { MechanismSource } from "../engine/mechanismSource";
import { MechanismError } from "../errors";
import { loadMechanism } from "../mechanism";
import type { LoadedMechanism } from "../mechanism/types";
import { BUILTIN_MECHANISMS } from "../mechanisms";
import { mechanismContentId } from "../store/ids";
import { diagnosticLine } from "./diagnosticLine";
import { CliError, type CliIo, readTextFile } from "./io";

/** The source of a built-in id or of a document file; a document's errors throw MechanismError. */
export function mechanismArgument(io: CliIo, value: string): MechanismSource {
  const builtin = BUILTIN_MECHANISMS.find((m) => m.id === value);
  if (builtin) return { id: builtin.id, title: builtin.title };
  const text = readTextFile(
    io,
    value,
    `mechanism (not a built-in id: ${BUILTIN_MECHANISMS.map((m) => m.id).join(", ")}; so read as a file)`,
  );
  let loaded: LoadedMechanism;
  try {
    loaded = loadMechanism(text, { format: formatOf(value) });
  } catch (e) {
    if (!(e instanceof MechanismError)) throw e;
    throw new CliError(e.problems.map((d) => diagnosticLine(value, d)).join("\n"));
  }
  return { id: mechanismContentId(loaded.canonical), title: loaded.mechanism.title, text };
}

/** "json" for a .json file, "yaml" for .yaml/.yml, else the loader decides by the first character. */
export function formatOf(file: string): "json" | "yaml" | undefined {
  const ext = path.extname(file).toLowerCase();
  return ext === ".json" ? "json" : ext === ".yaml" || ext === ".yml" ? "yaml" : undefined;
}
