/**
 * The built-in mechanisms as the command line's bundle stores them (scripts/cli-bundle.mjs): the JSON of
 * each loaded mechanism, revived, is the mechanism loaded from its YAML, null-prototype species index included.
 */
import { isDeepStrictEqual } from "node:util";
import { describe, expect, it } from "vitest";
import { loadBuiltinMechanism } from "@/lib/mechanism";
import { reviveLoadedMechanism } from "@/lib/mechanism/builtinMechanisms";
import { prebuiltMechanisms } from "@/lib/mechanism/prebuiltMechanisms";
import { BUILTIN_MECHANISMS } from "@/lib/mechanisms";

describe("stored built-in mechanisms", () => {
  it("are not stored in the source: each is loaded from its YAML", () => {
    expect(prebuiltMechanisms()).toBeUndefined();
  });

  for (const { id } of BUILTIN_MECHANISMS) {
    it(`${id} comes back from its JSON form unchanged`, () => {
      const loaded = loadBuiltinMechanism(id);
      const revived = reviveLoadedMechanism(JSON.parse(JSON.stringify(loaded)));
      expect(Object.getPrototypeOf(revived.mechanism.speciesIndex)).toBeNull();
      expect(isDeepStrictEqual(revived, loaded)).toBe(true);
    });
  }

  it("a JSON round trip without the revival would not be (so the test above can fail)", () => {
    const loaded = loadBuiltinMechanism("oxygen");
    expect(isDeepStrictEqual(JSON.parse(JSON.stringify(loaded)), loaded)).toBe(false);
  });
});
