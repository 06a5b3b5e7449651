/**
 * Schema of an analysis request (zod), shared by the route and the worker.
 * Ranges: altitude 0–86 km (the 1976 standard's range), T 150–350 K, p > 0,
 * zenith 0–180°, latitude ±90°.
 */
import { z } from "zod";
import { InputError } from "../errors";
import { idRecordSchema } from "./idRecordSchema";
import type { AnalysisRequest } from "./types";

const finite = z.number().refine(Number.isFinite, "expected a finite number");

/**
 * A finite number within [min, max], `open` leaving out an end (a pressure above 0), with one message for
 * every bound. Bounds as checks, not refinements, so that z.toJSONSchema writes them into the OpenAPI document.
 */
export function finiteIn(min: number, max: number, message: string, open: { min?: boolean; max?: boolean } = {}) {
  const low = open.min ? finite.gt(min, message) : finite.min(min, message);
  return open.max ? low.lt(max, message) : low.max(max, message);
}
const mixingRatio = finiteIn(0, 1, "expected a mixing ratio between 0 and 1");

export const conditionSchema = z
  .object({
    altitude_km: finiteIn(0, 86, "expected an altitude between 0 and 86 km"),
    T_K: finiteIn(150, 350, "expected a temperature between 150 and 350 K").optional(),
    p_hPa: finiteIn(0, 1100, "expected a pressure above 0 and at most 1100 hPa", { min: true }).optional(),
    latitude_deg: finiteIn(-90, 90, "expected a latitude between -90 and 90°").optional(),
    date: z
      .string()
      .regex(/^\d{4}-\d{2}-\d{2}$/, "expected a date YYYY-MM-DD")
      .refine((s) => !Number.isNaN(Date.parse(`${s}T00:00:00Z`)), "expected a real calendar date")
      .optional(),
    localSolarTime_h: finiteIn(0, 24, "expected a local solar time between 0 and 24 h").optional(),
    zenith_deg: finiteIn(0, 180, "expected a zenith angle between 0 and 180°").optional(),
    mode: z.enum(["instantaneous", "diurnal"]).optional(),
    held: idRecordSchema(mixingRatio).optional(),
    poolTotals: idRecordSchema(mixingRatio).optional(),
    J: idRecordSchema(finiteIn(0, 10, "expected a photolysis frequency in s⁻¹ (0–10)", { max: true })).optional(),
    jScale: finiteIn(0, 100, "expected a factor between 0 and 100").optional(),
    ozone: z.enum(["held", "solved"]).optional(),
    o3ColumnAbove_DU: finiteIn(0, 2000, "expected an overhead ozone column between 0 and 2000 DU").optional(),
    aerosolSurface_um2cm3: finiteIn(
      0,
      10000,
      "expected an aerosol surface area density between 0 and 10000 µm² cm⁻³ (background ~1, after an eruption ~10–100)",
    ).optional(),
    cloud: z.enum(["none", "NAT", "ice", "auto"], "expected a cloud type: none, NAT, ice or auto").optional(),
    cloudSurface_um2cm3: finiteIn(
      0,
      10000,
      "expected a cloud surface area density between 0 and 10000 µm² cm⁻³ (NAT ~1, at most 100; ice ~200)",
    ).optional(),
    albedo: finiteIn(0, 1, "expected a ground albedo between 0 and 1").optional(),
    aerosolOpticalDepth: finiteIn(
      0,
      10,
      "expected an aerosol optical depth at 550 nm between 0 and 10 (background stratosphere ~0.005, after a large eruption ~0.1–0.3)",
    ).optional(),
  })
  .strict();

export const analysisRequestSchema = z
  .object({
    mechanismId: z.string().regex(/^[A-Za-z0-9_-]{1,80}$/, "expected a mechanism id"),
    condition: conditionSchema,
    options: z
      .object({
        fminRelative: finiteIn(0, 0.5, "expected a fraction between 0 and 0.5", { min: true, max: true }).optional(),
        oxDefinition: z.enum(["standard", "extended"]).optional(),
        uncertaintySamples: z
          .number()
          .int("expected a whole number of samples")
          .min(0, "expected 0 or more samples")
          .max(100_000, "expected at most 100000 samples")
          .optional(),
        uncertaintySeed: z
          .number()
          .int("expected an integer seed")
          .min(0, "expected a seed between 0 and 4294967295")
          .max(0xffffffff, "expected a seed between 0 and 4294967295")
          .optional(),
        sensitivity: z.boolean().optional(),
      })
      .strict()
      .optional(),
  })
  .strict();

/** Parses an analysis request or throws an InputError naming the first bad field. */
export function parseAnalysisRequest(body: unknown): AnalysisRequest {
  return parseWith(analysisRequestSchema, body) as AnalysisRequest;
}

/**
 * The path of the first own "__proto__" key in parsed JSON, or null. zod
 * drops such a key without a word, so it is looked for first: like every
 * unknown key it is a 400. (Bodies are pre-scanned to 64 levels, so the
 * recursion is bounded.)
 */
export function prototypeKeyPath(value: unknown, path: (string | number)[] = []): (string | number)[] | null {
  if (value === null || typeof value !== "object") return null;
  if (Array.isArray(value)) {
    for (let i = 0; i < value.length; i++) {
      const found = prototypeKeyPath(value[i], [...path, i]);
      if (found) return found;
    }
    return null;
  }
  // the keys of an id-keyed map are the mechanism's ids, which may be "__proto__" (idRecordSchema keeps
  // them; an id the mechanism does not have is refused against the mechanism, like any unknown id)
  const idKeyed = ID_KEYED_MAPS.has(String(path[path.length - 1])) && path[path.length - 2] === "condition";
  if (!idKeyed && Object.hasOwn(value, "__proto__")) return [...path, "__proto__"];
  for (const [k, v] of Object.entries(value)) {
    const found = prototypeKeyPath(v, [...path, k]);
    if (found) return found;
  }
  return null;
}

/** Condition maps keyed by species, pool or channel ids (conditionSchema: held, poolTotals, J). */
const ID_KEYED_MAPS = new Set(["held", "poolTotals", "J"]);

const formatPath = (path: PropertyKey[]) =>
  path
    .map((p) => (typeof p === "number" ? `[${p}]` : String(p)))
    .join(".")
    .replace(/\.\[/g, "[");

export function parseWith<T>(schema: z.ZodType<T>, body: unknown): T {
  const proto = prototypeKeyPath(body);
  if (proto) throw new InputError(formatPath(proto), 'unknown key "__proto__"', "invalid-request");
  const r = schema.safeParse(body);
  if (r.success) return r.data;
  const issue = r.error.issues[0];
  throw new InputError(formatPath(issue.path) || "(body)", issue.message, "invalid-request");
}
