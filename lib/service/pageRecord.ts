/**
 * The one rule for pages that show a stored thing: an id that names nothing is
 * a 404 (the page calls `notFound()` on null), and every other failure, a store
 * that cannot be read above all, reaches the error boundary (app/error.tsx)
 * and answers 500. A deleted thing is answered before the page by proxy.ts
 * (410, lib/service/recordPages.ts); a 410 here means it was deleted between
 * that check and the read, and is shown as missing.
 */
import "server-only";
import { HttpError } from "./http";

/** The value of `read`, or null when it names nothing (404) or nothing any more (410); other errors propagate. */
export async function recordForPage<T>(read: Promise<T>): Promise<T | null> {
  try {
    return await read;
  } catch (e) {
    if (e instanceof HttpError && (e.status === 404 || e.status === 410)) return null;
    throw e;
  }
}
