import { describe, expect, it, vi } from "vitest";
import { clientAddress, rateConfigFromEnv } from "@/lib/service/rateLimit";

vi.mock("server-only", () => ({}));

const req = (xff?: string) => new Request("http://x/api/analyses", { headers: xff ? { "x-forwarded-for": xff } : {} });

describe("the client address of the rate limits", () => {
  it("is the last X-Forwarded-For entry (the socket's, appended by scripts/serve.mjs): a forged header does not help", () => {
    expect(clientAddress(req("198.51.100.7"), 0)).toBe("198.51.100.7");
    expect(clientAddress(req("1.2.3.4, 5.6.7.8, 198.51.100.7"), 0)).toBe("198.51.100.7");
  });

  it("is that many entries further left behind trusted proxies", () => {
    expect(clientAddress(req("203.0.113.9, 10.0.0.2"), 1)).toBe("203.0.113.9");
    expect(clientAddress(req("forged, 203.0.113.9, 10.0.0.2"), 1)).toBe("203.0.113.9");
    expect(clientAddress(req("10.0.0.2"), 1)).toBe("10.0.0.2");
    expect(clientAddress(req(), 0)).toBe("unknown");
  });

  it("has defaults a classroom of 40 behind one address can live with, and refuses bad settings", () => {
    expect(rateConfigFromEnv({})).toEqual({ points: 600, window_s: 60, trustedProxies: 0 });
    expect(rateConfigFromEnv({ OZONE_RATE_LIMIT: "30", OZONE_RATE_WINDOW_S: "10" })).toMatchObject({
      points: 30,
      window_s: 10,
    });
    expect(() => rateConfigFromEnv({ OZONE_RATE_LIMIT: "0" })).toThrow(/OZONE_RATE_LIMIT/);
  });
});
