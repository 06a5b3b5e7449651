import { createHash, randomBytes } from "node:crypto";

/** 96 random bits as base64url: 16 characters, not guessable. */
export function newRecordId(): string {
  return randomBytes(12).toString("base64url");
}

/** Content address of a mechanism: "m-" + 32 hex characters of SHA-256(canonical form). */
export function mechanismContentId(canonical: string): string {
  return `m-${createHash("sha256").update(canonical).digest("hex").slice(0, 32)}`;
}

/** Ids we hand out: base64url record ids, content ids, or built-in names. */
export const ID_PATTERN = /^[A-Za-z0-9_-]{1,80}$/;
