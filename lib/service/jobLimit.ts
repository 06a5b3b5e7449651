/**
 * A limit on the jobs (sweeps, comparisons, Monte Carlo runs) one client
 * address has queued or running at once: OZONE_JOBS_PER_CLIENT, default 40,
 * so that a classroom behind one address can run a sweep each. The ids of a
 * client's jobs are kept in memory, or in a Redis set when REDIS_URL is set
 * (every web instance sees the same), and a job leaves the count when its
 * status is final. Two submissions at the same instant may both pass: the
 * limit bounds abuse, it is not a quota.
 */
import "server-only";
import { Redis } from "ioredis";
import { isFinal, type JobBackend, type JobStatus } from "../jobs/types";
import { HttpError } from "./http";

export const JOB_LIMIT_DEFAULTS = {
  /** jobs one client address may have queued or running (OZONE_JOBS_PER_CLIENT); default 40 */
  perClient: 40,
  /** how long a Redis set of a client's job ids lives after its last job, s; default 1 day */
  keep_s: 86_400,
};

export function jobLimitFromEnv(env: Record<string, string | undefined> = process.env): number {
  const v = env.OZONE_JOBS_PER_CLIENT;
  if (v === undefined || v === "") return JOB_LIMIT_DEFAULTS.perClient;
  const n = Number(v);
  if (!Number.isInteger(n) || n < 1) {
    throw new Error(`OZONE_JOBS_PER_CLIENT: expected an integer ≥ 1, got ${JSON.stringify(v)}`);
  }
  return n;
}

/** Where a client's job ids are kept. */
export interface JobLedger {
  ids(client: string): Promise<string[]>;
  add(client: string, id: string): Promise<void>;
  remove(client: string, ids: string[]): Promise<void>;
}

export function memoryLedger(): JobLedger {
  const byClient = new Map<string, Set<string>>();
  return {
    async ids(client) {
      return [...(byClient.get(client) ?? [])];
    },
    async add(client, id) {
      const set = byClient.get(client) ?? new Set<string>();
      set.add(id);
      byClient.set(client, set);
    },
    async remove(client, ids) {
      const set = byClient.get(client);
      for (const id of ids) set?.delete(id);
      if (set && set.size === 0) byClient.delete(client);
    },
  };
}

export function redisLedger(redis: Redis, prefix: string): JobLedger {
  const key = (client: string) => `${prefix}:client-jobs:${client}`;
  return {
    ids: (client) => redis.smembers(key(client)),
    async add(client, id) {
      await redis.multi().sadd(key(client), id).expire(key(client), JOB_LIMIT_DEFAULTS.keep_s).exec();
    },
    async remove(client, ids) {
      if (ids.length) await redis.srem(key(client), ...ids);
    },
  };
}

/**
 * Submits a job for `client` unless it already has `limit` jobs that are not
 * final; 429 "too-many-jobs" then.
 */
export async function submitWithinLimit(
  ledger: JobLedger,
  backend: JobBackend,
  client: string,
  limit: number,
  submit: () => Promise<JobStatus>,
): Promise<JobStatus> {
  const ids = await ledger.ids(client);
  const statuses = await Promise.all(ids.map((id) => backend.status(id).catch(() => null)));
  const ended = ids.filter((_, i) => !statuses[i] || isFinal((statuses[i] as JobStatus).state));
  await ledger.remove(client, ended);
  if (ids.length - ended.length >= limit) {
    throw new HttpError(
      429,
      "too-many-jobs",
      `this address already has ${limit} jobs queued or running; wait for one to finish or cancel one`,
      "(client)",
      { "retry-after": "10" },
    );
  }
  const s = await submit();
  await ledger.add(client, s.id);
  return s;
}

const KEY = Symbol.for("ozone.jobLedger");

/** The process's ledger: in Redis when REDIS_URL is set, else in memory. */
export function jobLedger(): JobLedger {
  const g = globalThis as unknown as Record<symbol, JobLedger | undefined>;
  if (g[KEY]) return g[KEY];
  const url = process.env.REDIS_URL;
  g[KEY] = url
    ? redisLedger(new Redis(url, { maxRetriesPerRequest: 2 }), process.env.OZONE_QUEUE_PREFIX || "ozone")
    : memoryLedger();
  return g[KEY];
}
