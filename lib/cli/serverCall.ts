/**
 * `--server URL`: a command's request sent to a running service through the typed client (lib/client)
 * instead of being computed in this process. A mechanism file is uploaded first (the service then knows it
 * by its own id); the service's answers and refusals become the command's output and one-line errors.
 */
import { ApiError, OzoneCyclesClient } from "../client";
import type { MechanismSource } from "../engine/mechanismSource";
import { CliError, EXIT } from "./io";

/** A client of the service at `url`; an address that is not http(s) is a usage error. */
export function serverClient(url: string): OzoneCyclesClient {
  try {
    return new OzoneCyclesClient({ baseUrl: url });
  } catch {
    throw new CliError(`invalid --server ${url}: expected an http:// or https:// address`, EXIT.usage);
  }
}

/** The id the service knows the mechanism by: a built-in's own, or that of the uploaded document. */
export async function serverMechanismId(client: OzoneCyclesClient, src: MechanismSource): Promise<string> {
  if (src.text === undefined) return src.id;
  return (await client.uploadMechanism(src.text)).id;
}

/** The address of a page path the service answered with (e.g. /a/{id}), under the service's address as the client forms its calls. */
export const serverPermalink = (url: string, page: string) => `${url.replace(/\/+$/, "")}${page}`;

/** Runs `work` against the service at `url`; a refusal or an unreachable service is a CliError naming it. */
export async function onServer<T>(url: string, work: () => Promise<T>): Promise<T> {
  try {
    return await work();
  } catch (e) {
    if (e instanceof ApiError) {
      throw new CliError(`the service at ${url} answered ${e.message}`);
    }
    if (e instanceof TypeError && /fetch failed/i.test(e.message)) {
      const cause = (e as { cause?: { code?: string; message?: string } }).cause;
      throw new CliError(`cannot reach the service at ${url}: ${cause?.code ?? cause?.message ?? e.message}`);
    }
    throw e;
  }
}
