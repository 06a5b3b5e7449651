/**
 * Mechanism uploads and look-ups. The document is parsed and checked in an
 * engine worker (the main thread only moves bytes and pre-scans the JSON
 * wrapper's nesting); nothing is stored unless it loads without error. Each
 * upload gets its own random id, not derivable from the content, and is
 * listed only to its owner (owner.ts); ids of the content-hash form ("m-…")
 * stored before that keep working.
 */
import "server-only";
import type { MechanismSource } from "../engine/mechanismSource";
import { compileSource } from "../engine/mechanismSource";
import { summarise } from "../engine/mechanismSummary";
import { builtinMechanisms, loadBuiltinMechanism } from "../mechanism";
import { enginePool } from "../runtime/pool";
import { getStore, ID_PATTERN, newRecordId } from "../store";
import { notFound } from "./http";
import { DELETION_NOTE, deleteWithToken, liveOrThrow, newDeletionToken } from "./lifecycle";
import { ownerHash } from "./owner";

/** Largest mechanism upload accepted, bytes (the loader's own text limit is 2 MiB). */
export const MAX_MECHANISM_BODY = 4 * 1024 * 1024;

/** A new upload id: "u-" + 96 random bits. */
const newUploadId = () => `u-${newRecordId()}`;

/**
 * Body is { text, format? } as JSON, or the document itself (YAML or JSON),
 * as raw bytes: they are moved to an engine worker, which decodes, pre-scans,
 * parses and checks them. `owner` is the uploader's cookie value.
 */
export async function uploadMechanism(body: Uint8Array, contentType: string, owner: string) {
  const job = { kind: "check-upload" as const, body, contentType };
  const checked = (await enginePool().run(job, undefined, [body.buffer as ArrayBuffer])).result;
  const text = checked.text;
  const id = newUploadId();
  const deletion = newDeletionToken();
  await getStore().putMechanism({
    id,
    title: checked.title,
    description: checked.description,
    text,
    format: checked.format,
    speciesCount: checked.speciesCount,
    reactionCount: checked.reactionCount,
    createdAt: new Date().toISOString(),
    contentHash: checked.contentHash,
    ownerHash: ownerHash(owner),
    deleteHash: deletion.hash,
  });
  return {
    id,
    title: checked.title,
    created: true,
    deletionToken: deletion.token,
    deletionNote: DELETION_NOTE,
    summary: {
      species: checked.speciesCount,
      reactions: checked.reactionCount,
      pools: checked.pools,
      conservation: checked.conservation,
      photolysisChannels: checked.photolysisChannels,
    },
    warnings: checked.warnings,
  };
}

/** The built-ins, and the uploads of the client with this owner cookie value (none without one). */
export async function listMechanisms(owner?: string) {
  const builtins = builtinMechanisms().map((b) => {
    const m = loadBuiltinMechanism(b.id).mechanism;
    return {
      id: b.id,
      title: b.title,
      description: b.description,
      builtin: true,
      speciesCount: m.species.length,
      reactionCount: m.reactions.length,
    };
  });
  const hash = ownerHash(owner);
  const own = hash ? await getStore().listMechanisms(50, hash) : [];
  const uploads = own.map((m) => ({
    id: m.id,
    title: m.title,
    description: m.description,
    builtin: false,
    speciesCount: m.speciesCount,
    reactionCount: m.reactionCount,
    createdAt: m.createdAt,
  }));
  return { mechanisms: [...builtins, ...uploads] };
}

/** DELETE /api/mechanisms/{id} with its deletion token. Built-ins have none. */
export async function deleteMechanism(id: string, token: string | null): Promise<void> {
  await deleteWithToken([{ kind: "mechanism", id }], token, "mechanism");
}

/** The source of a mechanism for the engine, or a 404. */
export async function mechanismSource(id: string): Promise<MechanismSource> {
  if (!ID_PATTERN.test(id)) throw notFound("mechanism", id);
  const builtin = builtinMechanisms().find((b) => b.id === id);
  if (builtin) return { id, title: builtin.title };
  const stored = liveOrThrow(await getStore().getMechanism(id), "mechanism", id);
  return { id, title: stored.title, text: stored.text };
}

/** A mechanism's text, species, reactions and pools; an upload is compiled in an engine worker, not here. */
export async function mechanismDetail(id: string) {
  const src = await mechanismSource(id);
  if (src.text === undefined) return summarise(id, true, compileSource(src), loadBuiltinText(id));
  const { result } = await enginePool().run({ kind: "describe-mechanism", mechanism: src });
  return { ...result, text: src.text };
}

function loadBuiltinText(id: string): string {
  return loadBuiltinMechanism(id).text ?? "";
}
