/**
 * Rate limits per client address on the routes that compute or store
 * (rate-limiter-flexible 11): a fixed window of OZONE_RATE_LIMIT requests per
 * OZONE_RATE_WINDOW_S seconds. In memory in one process; on Redis when
 * REDIS_URL is set, so that every web instance counts against one total
 * (with an in-memory limiter as insurance while Redis is unreachable). Over
 * the limit: 429 with Retry-After.
 *
 * The client address is the last entry of X-Forwarded-For, which Next.js's
 * server appends from the socket; behind OZONE_TRUSTED_PROXIES proxies of
 * your own it is that many entries further left (a client cannot forge the
 * entries that trusted proxies append).
 */
import "server-only";
import { Redis } from "ioredis";
import { RateLimiterMemory, RateLimiterRedis, RateLimiterRes } from "rate-limiter-flexible";
import { HttpError } from "./http";

export const RATE_DEFAULTS = {
  /** requests per window per client address on computing or storing routes (OZONE_RATE_LIMIT); default 600, a classroom of 40 behind one address recomputing every 4 s */
  points: 600,
  /** window, s (OZONE_RATE_WINDOW_S); default 60 */
  window_s: 60,
  /** proxies of your own in front of the service (OZONE_TRUSTED_PROXIES); default 0 */
  trustedProxies: 0,
};

export type RateConfig = typeof RATE_DEFAULTS;

const int = (v: string | undefined, name: string, min: number, d: number): number => {
  if (v === undefined || v === "") return d;
  const n = Number(v);
  if (!Number.isInteger(n) || n < min)
    throw new Error(`${name}: expected an integer ≥ ${min}, got ${JSON.stringify(v)}`);
  return n;
};

export function rateConfigFromEnv(env: Record<string, string | undefined> = process.env): RateConfig {
  return {
    points: int(env.OZONE_RATE_LIMIT, "OZONE_RATE_LIMIT", 1, RATE_DEFAULTS.points),
    window_s: int(env.OZONE_RATE_WINDOW_S, "OZONE_RATE_WINDOW_S", 1, RATE_DEFAULTS.window_s),
    trustedProxies: int(env.OZONE_TRUSTED_PROXIES, "OZONE_TRUSTED_PROXIES", 0, RATE_DEFAULTS.trustedProxies),
  };
}

/** The client address of a request, as described in this file's header. */
export function clientAddress(req: Request, trustedProxies: number): string {
  const hops = (req.headers.get("x-forwarded-for") ?? "")
    .split(",")
    .map((s) => s.trim())
    .filter(Boolean);
  return hops[hops.length - 1 - trustedProxies] ?? hops[0] ?? "unknown";
}

export interface Limiter {
  config: RateConfig;
  limiter: RateLimiterMemory | RateLimiterRedis;
  /** the Redis connection of a shared limiter */
  redis?: Redis;
}

const KEY = Symbol.for("ozone.rateLimiter");

/**
 * A limiter of this configuration: in memory, or counting in Redis at
 * `redisUrl` under `prefix` (each web instance makes its own, and they share
 * the count).
 */
export function createLimiter(config: RateConfig, redisUrl?: string, prefix = "ozone"): Limiter {
  const opts = { points: config.points, duration: config.window_s, keyPrefix: "ozone-rate" };
  if (!redisUrl) return { config, limiter: new RateLimiterMemory(opts) };
  // commands fail at once while Redis is away (also before the first connection); the insurance limiter counts meanwhile
  const redis = new Redis(redisUrl, { enableOfflineQueue: false, maxRetriesPerRequest: 1 });
  return {
    config,
    redis,
    limiter: new RateLimiterRedis({
      ...opts,
      keyPrefix: `${prefix}:rate`,
      storeClient: redis,
      insuranceLimiter: new RateLimiterMemory(opts),
    }),
  };
}

function limiter(): Limiter {
  const g = globalThis as unknown as Record<symbol, Limiter | undefined>;
  g[KEY] ??= createLimiter(rateConfigFromEnv(), process.env.REDIS_URL, process.env.OZONE_QUEUE_PREFIX || "ozone");
  return g[KEY];
}

/** The client address of a request under the configured proxies. */
export const clientOf = (req: Request): string => clientAddress(req, limiter().config.trustedProxies);

/** Counts one request of the client against its limit; 429 with Retry-After when over it. */
export async function limitRequest(req: Request, using: Limiter = limiter()): Promise<void> {
  const { config, limiter: l } = using;
  try {
    await l.consume(clientAddress(req, config.trustedProxies));
  } catch (e) {
    if (!(e instanceof RateLimiterRes)) throw e;
    const retry_s = Math.max(1, Math.ceil(e.msBeforeNext / 1000));
    throw new HttpError(
      429,
      "rate-limited",
      `more than ${config.points} requests in ${config.window_s} s from this address; retry in ${retry_s} s`,
      "(client)",
      { "retry-after": String(retry_s) },
    );
  }
}
