import { describe, expect, it } from "vitest";
import { parseAssessmentSpec, QUESTION_TEMPLATES } from "@/lib/assessment";
import {
  type BuilderForm,
  builderCondition,
  builderSpec,
  formNumber,
  initialBuilderBase,
  toleranceText,
} from "@/lib/assessment/builderRequest";
import { CONDITION_DEFAULTS } from "@/lib/atmosphere/condition";

const off = { on: false, min: "", max: "" };

function form(patch: Partial<BuilderForm> = {}): BuilderForm {
  return {
    title: "Problem set",
    mechanismId: "oxygen-chlorine",
    variants: "4",
    seed: "",
    base: initialBuilderBase(35, CONDITION_DEFAULTS),
    ranges: { altitude_km: { on: true, min: "25", max: "45" }, latitude_deg: off, localSolarTime_h: off, Cly: off },
    instructions: "  ",
    questions: [
      { kind: "dominant-family", cycleId: "", speciesA: "", speciesB: "", tolerance: "", points: "1" },
      { kind: "chain-length", cycleId: "c1", speciesA: "ClO", speciesB: "", tolerance: "10", points: "2" },
      { kind: "species-ratio", cycleId: "c1", speciesA: "ClO", speciesB: "Cl", tolerance: "5", points: "" },
      { kind: "clox-share-change", cycleId: "", speciesA: "", speciesB: "", tolerance: "2", points: "1" },
    ],
    ...patch,
  };
}

describe("formNumber", () => {
  it("reads a blank field as undefined (the server's default) and text that is no number as NaN", () => {
    expect(formNumber("")).toBeUndefined();
    expect(formNumber("  ")).toBeUndefined();
    expect(formNumber("2.5")).toBe(2.5);
    expect(formNumber("abc")).toBeNaN();
  });
});

describe("initialBuilderBase", () => {
  it("starts the base fields from the condition defaults it is given", () => {
    expect(initialBuilderBase(35, { latitude_deg: 60, date: "2027-01-05", localSolarTime_h: 9 })).toEqual({
      altitude_km: "35",
      latitude_deg: "60",
      date: "2027-01-05",
      localSolarTime_h: "9",
    });
  });
});

describe("builderCondition", () => {
  it("leaves blank fields out so that the server's defaults apply", () => {
    expect(builderCondition({ altitude_km: "30", latitude_deg: "", date: "", localSolarTime_h: "" })).toEqual({
      altitude_km: 30,
      latitude_deg: undefined,
      date: undefined,
      localSolarTime_h: undefined,
    });
  });
});

describe("toleranceText", () => {
  it("shows a relative tolerance in %, an absolute one in its unit, an exact one as blank", () => {
    expect(toleranceText({ kind: "relative", rel: 0.1 })).toBe("10");
    expect(toleranceText({ kind: "absolute", abs: 2 })).toBe("2");
    expect(toleranceText({ kind: "exact" })).toBe("");
  });
});

describe("builderSpec", () => {
  it("shapes the form into a request the assessment schema accepts", () => {
    const spec = builderSpec(form(), QUESTION_TEMPLATES);
    const parsed = parseAssessmentSpec(JSON.parse(JSON.stringify(spec)));
    expect(parsed.base).toEqual({ altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 });
    expect(parsed.ranges).toEqual({ altitude_km: { min: 25, max: 45 } });
    expect(parsed.variants).toBe(4);
    expect(parsed.seed).toBeUndefined();
    expect(parsed.instructions).toBeUndefined();
  });

  it("sends each question only the parameters its template needs, tolerances in the template's kind", () => {
    const [family, chain, ratio, share] = builderSpec(form(), QUESTION_TEMPLATES).questions;
    expect(family).toEqual({
      kind: "dominant-family",
      cycleId: undefined,
      speciesA: undefined,
      speciesB: undefined,
      tolerance: undefined,
      points: 1,
    });
    expect(chain).toMatchObject({ cycleId: "c1", speciesA: undefined, tolerance: { kind: "relative", rel: 0.1 } });
    expect(ratio).toMatchObject({ cycleId: undefined, speciesA: "ClO", speciesB: "Cl", points: undefined });
    expect(ratio.tolerance).toEqual({ kind: "relative", rel: 0.05 });
    expect(share.tolerance).toEqual({ kind: "absolute", abs: 2 });
  });

  it("sends a Cly range typed in ppbv as a pool-total mixing ratio", () => {
    const spec = builderSpec(
      form({
        ranges: { altitude_km: off, latitude_deg: off, localSolarTime_h: off, Cly: { on: true, min: "2", max: "4" } },
      }),
      QUESTION_TEMPLATES,
    );
    expect(spec.ranges).toEqual({ poolTotals: { Cly: { min: 2e-9, max: 4e-9 } } });
  });

  it("passes a field that is no number on as NaN, which the schema refuses with the field's path", () => {
    const spec = builderSpec(form({ variants: "many" }), QUESTION_TEMPLATES);
    expect(spec.variants).toBeNaN();
    expect(() => parseAssessmentSpec(JSON.parse(JSON.stringify(spec)))).toThrow(
      expect.objectContaining({ path: "variants" }),
    );
  });

  it("throws if a question's kind has no template", () => {
    expect(() => builderSpec(form(), [])).toThrow(/builderSpec: no template of kind dominant-family/);
  });
});
