/**
 * The OpenAPI document (lib/service/openapi.ts, served as /api/openapi.json) against the zod schemas the
 * routes parse with: it is valid OpenAPI 3.1 (the published schema of the specification, through
 * @seriousme/openapi-schema-validator), every $ref resolves, each generated request schema has exactly the
 * fields of its zod schema (walked from zod's own definitions, not from the generator), and zod and a
 * JSON Schema validator (ajv, 2020-12) accept and refuse the same bodies. A field added to a route's schema
 * and not to the document, or the other way round, fails here.
 */
import { Validator } from "@seriousme/openapi-schema-validator";
import { Ajv2020 } from "ajv/dist/2020.js";
import { describe, expect, it } from "vitest";
import { z } from "zod";
import { analysisRequestSchema } from "@/lib/engine/requestSchema";
import { parseComparisonRequest } from "@/lib/profiles";
import { jsonSchemaOf } from "@/lib/service/jsonSchemaOf";
import { GENERATED_SCHEMAS, openApiDocument } from "@/lib/service/openapi";

type Json = Record<string, unknown>;
const doc = JSON.parse(JSON.stringify(openApiDocument)) as Json;
const components = (doc.components as { schemas: Record<string, Json> }).schemas;

/** The node a local $ref points to, or undefined. */
function resolve(ref: string): Json | undefined {
  let node: unknown = doc;
  for (const part of ref.replace(/^#\//, "").split("/")) node = (node as Json | undefined)?.[part];
  return node as Json | undefined;
}

function* refsIn(node: unknown): Generator<string> {
  if (node === null || typeof node !== "object") return;
  for (const [k, v] of Object.entries(node)) {
    if (k === "$ref" && typeof v === "string") yield v;
    else yield* refsIn(v);
  }
}

/**
 * Every field path of a zod schema, "!" marking the required ones: "condition.altitude_km!". Alternatives
 * of a union go under "<i>", array items under "[]". Built from zod's definitions alone.
 */
function zodFields(schema: z.core.$ZodType, at = ""): string[] {
  const def = schema._zod.def as unknown as Json & { type: string };
  switch (def.type) {
    case "object":
      return Object.entries(def.shape as Record<string, z.core.$ZodType>).flatMap(([key, s]) => {
        const path = at ? `${at}.${key}` : key;
        const optional = (s._zod as { optin?: string }).optin === "optional";
        return [`${path}${optional ? "" : "!"}`, ...zodFields(s, path)];
      });
    case "optional":
      return zodFields(def.innerType as z.core.$ZodType, at);
    case "union":
      return (def.options as z.core.$ZodType[]).flatMap((s, i) => zodFields(s, `${at}<${i}>`));
    case "array":
      return zodFields(def.element as z.core.$ZodType, `${at}[]`);
    case "record":
      return zodFields(def.valueType as z.core.$ZodType, `${at}{}`);
    default:
      return [];
  }
}

/** The same paths read from a JSON Schema of the document ($refs followed). */
function docFields(node: Json, at = ""): string[] {
  if (typeof node.$ref === "string") return docFields(resolve(node.$ref) as Json, at);
  const alternatives = (node.oneOf ?? node.anyOf) as Json[] | undefined;
  if (alternatives) return alternatives.flatMap((s, i) => docFields(s, `${at}<${i}>`));
  if (node.type === "array") return docFields(node.items as Json, `${at}[]`);
  const props = node.properties as Record<string, Json> | undefined;
  if (props) {
    const required = new Set((node.required as string[] | undefined) ?? []);
    return Object.entries(props).flatMap(([key, s]) => {
      const path = at ? `${at}.${key}` : key;
      return [`${path}${required.has(key) ? "!" : ""}`, ...docFields(s, path)];
    });
  }
  // an id-keyed or free-keyed map (z.record, idRecordSchema): its values
  if (node.type === "object" && node.additionalProperties && typeof node.additionalProperties === "object")
    return docFields(node.additionalProperties as Json, `${at}{}`);
  return [];
}

describe("the OpenAPI document", () => {
  it("is valid OpenAPI 3.1 by the specification's published schema", async () => {
    const validator = new Validator();
    const res = await validator.validate(structuredClone(doc));
    expect(res.errors ?? []).toEqual([]);
    expect(res.valid).toBe(true);
    expect(validator.version).toBe("3.1");
  });

  it("resolves every $ref", () => {
    const refs = [...refsIn(doc)];
    expect(refs.length).toBeGreaterThan(20);
    for (const ref of refs) expect(resolve(ref), ref).toBeDefined();
  });

  it("has no schema left empty by the generator (a zod type with no JSON Schema)", () => {
    const empty: string[] = [];
    const walk = (node: unknown, path: string) => {
      if (node === null || typeof node !== "object") return;
      for (const [k, v] of Object.entries(node)) {
        const here = `${path}/${k}`;
        // z.record(…, z.unknown()) and the comparison's free-form sides are meant to take anything
        const free = k === "additionalProperties";
        if (!free && v && typeof v === "object" && !Array.isArray(v) && Object.keys(v).length === 0) empty.push(here);
        walk(v, here);
      }
    };
    walk(components, "#/components/schemas");
    expect(empty).toEqual([]);
  });
});

describe("the document's request schemas and the routes' zod schemas", () => {
  for (const [name, schema] of Object.entries(GENERATED_SCHEMAS)) {
    it(`${name} has the fields of its zod schema, no more, required alike`, () => {
      expect(components[name], name).toBeDefined();
      expect(docFields(components[name]).sort()).toEqual(zodFields(schema).sort());
    });
  }

  it("the field walk sees a field added to a zod schema (so the test above can fail)", () => {
    const widened = analysisRequestSchema.extend({ note: z.string().optional() });
    expect(zodFields(widened)).toContain("note");
    expect(docFields(components.AnalysisRequest)).not.toContain("note");
    expect(docFields(jsonSchemaOf(widened))).toContain("note");
  });

  it("refuses prose for a field the schema does not have", () => {
    expect(() => jsonSchemaOf(analysisRequestSchema, { prose: { "condition.colour": { description: "x" } } })).toThrow(
      /condition\.colour/,
    );
  });

  // Bodies at and across the schemas' bounds (the bounds themselves: lib/engine/requestSchema.ts and the other
  // request schemas). Each is given to the route's parser and to ajv with the document's schema.
  const at30 = { mechanismId: "reference", condition: { altitude_km: 30 } };
  const sweep = { mechanismId: "reference", profile: { kind: "standard" } };
  const quiz = { title: "Quiz", mechanismId: "reference", variants: 3, base: { altitude_km: 30 } };
  const cases: Record<string, { parse: (b: unknown) => unknown; bodies: unknown[] }> = {
    AnalysisRequest: {
      parse: (b) => analysisRequestSchema.parse(b),
      bodies: [
        at30,
        { ...at30, condition: { altitude_km: 86, T_K: 150, p_hPa: 1100, latitude_deg: -90, zenith_deg: 180 } },
        { ...at30, condition: { altitude_km: 86.5 } },
        { ...at30, condition: { altitude_km: 30, p_hPa: 0 } },
        { ...at30, condition: { altitude_km: 30, T_K: 149.9 } },
        { ...at30, condition: { altitude_km: 30, held: { O3: 2e-6 }, J: { jO3: 9.99 } } },
        { ...at30, condition: { altitude_km: 30, held: { O3: 1.5 } } },
        { ...at30, condition: { altitude_km: 30, J: { jO3: 10 } } },
        { ...at30, condition: { altitude_km: 30, cloud: "NAT", mode: "diurnal", ozone: "solved" } },
        { ...at30, condition: { altitude_km: 30, cloud: "PSC" } },
        { ...at30, condition: { altitude_km: 30, colour: "blue" } },
        { ...at30, condition: { altitude_km: 30, date: "20 March" } },
        { ...at30, options: { fminRelative: 0.5 } },
        { ...at30, options: { fminRelative: 0.01, uncertaintySamples: 100, uncertaintySeed: 0xffffffff } },
        { ...at30, options: { uncertaintySamples: 1.5 } },
        { ...at30, options: { uncertaintySeed: 0x100000000 } },
        { mechanismId: "ref erence", condition: { altitude_km: 30 } },
        { mechanismId: "reference" },
        { ...at30, extra: true },
      ],
    },
    SweepRequest: {
      parse: (b) => GENERATED_SCHEMAS.SweepRequest.parse(b),
      bodies: [
        sweep,
        { ...sweep, grid: { from_km: 0, to_km: 86, step_km: 0.05 } },
        { ...sweep, grid: { step_km: 0.04 } },
        { ...sweep, profile: { kind: "csv", csv: "z_km,T_K\n" } },
        { ...sweep, profile: { kind: "csv", csv: "" } },
        { ...sweep, profile: { kind: "demo" } },
        { ...sweep, profile: { kind: "balloon" } },
        { ...sweep, condition: { latitude_deg: 70 } },
        { ...sweep, condition: { altitude_km: 30 } },
        { ...sweep, options: { parallel: "sequential", maxColumnPasses: 10, columnTolerance: 0.5 } },
        { ...sweep, options: { maxColumnPasses: 11 } },
        { ...sweep, options: { columnTolerance: 1 } },
      ],
    },
    ComparisonRequest: {
      parse: parseComparisonRequest,
      bodies: [
        { a: { sweepId: "abc" }, b: sweep },
        { a: sweep, b: { ...sweep, grid: { step_km: 2 } }, labels: { a: "base" }, topCycles: 50 },
        { a: { sweepId: "abc" }, b: { sweepId: "def" }, topCycles: 51 },
        { a: { sweepId: "abc" } },
        { a: { sweepId: "a b" }, b: sweep },
        { a: { sweepId: "abc" }, b: { ...sweep, grid: { step_km: 0 } } },
      ],
    },
    RunRequest: {
      parse: (b) => GENERATED_SCHEMAS.RunRequest.parse(b),
      bodies: [
        { ...at30, days: 1 },
        {
          ...at30,
          days: 60,
          start: { kind: "amounts", mixingRatios: { O3: 5e-6 } },
          options: { sunFollowsDate: false },
        },
        { ...at30, days: 61 },
        { ...at30, days: 2.5 },
        { ...at30, days: 3, start: { kind: "analysis" } },
        { ...at30, days: 3, start: { kind: "amounts", mixingRatios: { O3: 2 } } },
        { ...at30, days: 3, trajectory: { csv: "time_h,T_K\n0,220\n" } },
        { ...at30, days: 3, trajectory: { csv: "" } },
      ],
    },
    AssessmentSpec: {
      parse: (b) => GENERATED_SCHEMAS.AssessmentSpec.parse(b),
      bodies: [
        { ...quiz, questions: [{ kind: "dominant-family" }] },
        { ...quiz, variants: 41, questions: [{ kind: "dominant-family" }] },
        { ...quiz, questions: [] },
        { ...quiz, questions: [{ kind: "essay" }] },
        {
          ...quiz,
          ranges: { altitude_km: { min: 25, max: 35, step: 1 } },
          questions: [{ kind: "chain-length", cycleId: "c1", tolerance: { kind: "relative", rel: 0.05 }, points: 2 }],
        },
        { ...quiz, questions: [{ kind: "chain-length", tolerance: { kind: "relative", rel: 0 } }] },
      ],
    },
    UncertaintyJob: {
      parse: (b) => GENERATED_SCHEMAS.UncertaintyJob.parse(b),
      bodies: [
        { profileId: "abc", samples: 10 },
        { profileId: "abc", samples: -1 },
        { analysis: at30 },
        { analysis: { ...at30, condition: { altitude_km: 90 } } },
        { analysis: at30, samples: 3 },
      ],
    },
    MechanismUpload: {
      parse: (b) => GENERATED_SCHEMAS.MechanismUpload.parse(b),
      bodies: [{ text: "species: []" }, { text: "" }, { text: "x", format: "json" }, { text: "x", format: "toml" }],
    },
  };

  const ajv = new Ajv2020({ strict: false, allErrors: false });
  ajv.addSchema(doc, "doc");

  for (const [name, { parse, bodies }] of Object.entries(cases)) {
    it(`${name}: the route's parser and the document accept and refuse the same bodies`, () => {
      const validate = ajv.getSchema(`doc#/components/schemas/${name}`);
      if (!validate) throw new Error(`no schema ${name}`);
      const verdicts = bodies.map((b) => {
        let zod = true;
        try {
          parse(b);
        } catch {
          zod = false;
        }
        return { body: JSON.stringify(b), zod, document: validate(b) as boolean };
      });
      expect(verdicts.filter((v) => v.zod !== v.document)).toEqual([]);
      // both kinds are among the cases, so the agreement is not trivial
      expect(new Set(verdicts.map((v) => v.zod))).toEqual(new Set([true, false]));
    });
  }
});
