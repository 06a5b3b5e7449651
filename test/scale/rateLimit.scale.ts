// The rate limit is shared between two web instances on one Redis: each makes its own limiter
// (lib/service/rateLimit.ts createLimiter, as two processes would), and together they let one client
// through exactly `points` times.
import { randomBytes } from "node:crypto";
import { describe, expect, it } from "vitest";
import { createLimiter, limitRequest } from "@/lib/service/rateLimit";
import { redisUrl } from "./services";

const req = (address: string) => new Request("http://x/api/analyses", { headers: { "x-forwarded-for": address } });

describe("rate limits on Redis", () => {
  it("two web instances on one Redis share one count per client address", async () => {
    const config = { points: 10, window_s: 60, trustedProxies: 0 };
    const prefix = `ozone-test-${randomBytes(4).toString("hex")}`;
    const one = createLimiter(config, redisUrl(), prefix);
    const two = createLimiter(config, redisUrl(), prefix);
    // until a connection is up, each instance counts alone (its insurance limiter in memory)
    for (const l of [one, two]) {
      if (l.redis?.status !== "ready") await new Promise((r) => l.redis?.once("ready", r));
    }
    const client = "203.0.113.50";
    const outcomes: string[] = [];
    for (let i = 0; i < 12; i++) {
      try {
        await limitRequest(req(client), i % 2 ? two : one);
        outcomes.push("ok");
      } catch (e) {
        outcomes.push(`${(e as { status: number }).status}`);
      }
    }
    expect(outcomes).toEqual([...Array(10).fill("ok"), "429", "429"]);
    // another client has its own count, on either instance
    await expect(limitRequest(req("203.0.113.51"), two)).resolves.toBeUndefined();
    // an instance alone (in memory) would have let all 12 through
    const alone = createLimiter(config);
    for (let i = 0; i < 10; i++) await limitRequest(req(client), alone);
    await expect(limitRequest(req(client), alone)).rejects.toMatchObject({ status: 429, code: "rate-limited" });
    one.redis?.disconnect();
    two.redis?.disconnect();
  });
});
