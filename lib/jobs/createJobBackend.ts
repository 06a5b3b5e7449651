/**
 * Chooses the job back end from configuration: BullMQ on Redis when
 * REDIS_URL is set (jobs run by `npm run worker` processes on any machine),
 * else the embedded back end (this process, its engine pool).
 */

import { BullmqJobBackend } from "./bullmqBackend";
import { bullmqConfigFromEnv } from "./bullmqConfig";
import { EmbeddedJobBackend } from "./embeddedBackend";
import type { JobBackend, JobHandler } from "./types";

export function createJobBackend(
  handlers: Readonly<Record<string, JobHandler<never>>>,
  env: NodeJS.ProcessEnv = process.env,
): JobBackend {
  if (env.REDIS_URL) return new BullmqJobBackend(bullmqConfigFromEnv(env), { kinds: Object.keys(handlers) });
  return new EmbeddedJobBackend(handlers);
}
