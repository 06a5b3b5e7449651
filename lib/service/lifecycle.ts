/**
 * Deletion tokens, tombstones and ownership of stored things. Creating a
 * mechanism, analysis, sweep, comparison or assessment hands out a random
 * deletion token once; only its SHA-256 is stored. DELETE with the token in
 * the `x-deletion-token` header drops the body and leaves a tombstone, so
 * that the links answer 410 Gone. A wrong token is a 403, compared in
 * constant time against the stored hash (or against a random one when the
 * thing has none), so that timing tells nothing.
 */
import "server-only";
import { createHash, randomBytes, timingSafeEqual } from "node:crypto";
import { getStore, ID_PATTERN, type RecordRef } from "../store";
import { HttpError, notFound } from "./http";

export const DELETION_HEADER = "x-deletion-token";
/** 256 random bits as base64url: 43 characters. */
export const DELETION_TOKEN_PATTERN = /^[A-Za-z0-9_-]{43}$/;
export const DELETION_NOTE =
  "Keep this deletion token: with it (header x-deletion-token) DELETE removes the record and its links answer 410 Gone. It is shown only once.";

export const sha256Hex = (s: string) => createHash("sha256").update(s).digest("hex");

/** A new deletion token and the hash that is stored. */
export function newDeletionToken(): { token: string; hash: string } {
  const token = randomBytes(32).toString("base64url");
  return { token, hash: sha256Hex(token) };
}

export function gone(what: string, id: string): HttpError {
  return new HttpError(410, "gone", `the ${what} ${id} was deleted or has expired`, "id");
}

/** A stored thing's body, or the 404 (never stored) or 410 (deleted, expired) that answers for it. */
export function liveOrThrow<T extends { deletedAt?: string }>(r: T | null, what: string, id: string): T {
  if (!r) throw notFound(what, id);
  if (r.deletedAt) throw gone(what, id);
  return r;
}

/**
 * Deletes `refs` (the first is the one the token belongs to; an assessment
 * has two links) when the token matches. Already gone: 410, also on a retry.
 */
export async function deleteWithToken(refs: RecordRef[], token: string | null, what: string): Promise<void> {
  const first = refs[0];
  if (!token || !DELETION_TOKEN_PATTERN.test(token)) {
    throw new HttpError(
      400,
      "invalid-token",
      `expected the deletion token (43 base64url characters) in the ${DELETION_HEADER} header`,
      DELETION_HEADER,
    );
  }
  const life = ID_PATTERN.test(first.id) ? await getStore().lifecycle(first) : null;
  if (!life) throw notFound(what, first.id);
  const given = Buffer.from(sha256Hex(token), "hex");
  const stored = life.deleteHash ? Buffer.from(life.deleteHash, "hex") : randomBytes(32);
  const match = timingSafeEqual(given, stored.length === 32 ? stored : randomBytes(32)) && life.deleteHash !== null;
  if (life.deletedAt) throw gone(what, first.id);
  if (!match)
    throw new HttpError(403, "forbidden", `the deletion token does not belong to this ${what}`, DELETION_HEADER);
  const at = new Date().toISOString();
  for (const ref of refs) await getStore().tombstone(ref, at);
}

/** The deletion token of a request (header), or null. */
export const deletionTokenOf = (req: Request) => req.headers.get(DELETION_HEADER);
