/**
 * The profiles offered without an upload: the default (standard atmosphere
 * with the default climatology) and the invented demonstration profiles of
 * lib/atmosphere, flagged as demo data.
 */
import type { DemoProfile } from "../atmosphere/types";
import { InputError } from "../errors";
import { fromDemoProfile } from "./fromDemoProfile";
import { parseProfileCsv } from "./parseProfileCsv";
import { STANDARD_PROFILE_ID, standardProfile } from "./standardProfile";
import type { Profile, ProfileSpec } from "./types";

export function builtinProfiles(demos: readonly DemoProfile[]): Profile[] {
  return [standardProfile(), ...demos.map(fromDemoProfile)];
}

/** The profile a spec names; throws an InputError at `path` for an unknown demo or a bad CSV. */
export function resolveProfileSpec(spec: ProfileSpec, demos: readonly DemoProfile[], path = "profile"): Profile {
  switch (spec.kind) {
    case "standard":
      return standardProfile();
    case "demo": {
      const d = demos.find((x) => x.id === spec.id);
      if (!d) {
        throw new InputError(
          `${path}.id`,
          `unknown demo profile "${spec.id}"; demo profiles: ${demos.map((x) => x.id).join(", ") || "none"}`,
        );
      }
      return fromDemoProfile(d);
    }
    case "csv": {
      const name = spec.name?.replace(/[^\w.\- ]/g, "").trim() || "profile.csv";
      const p = parseProfileCsv(spec.csv, { fileName: name });
      return { ...p, title: p.title === name ? name : p.title };
    }
    default:
      throw new InputError(`${path}.kind`, `unknown profile kind; use "standard", "demo" or "csv"`);
  }
}

export { STANDARD_PROFILE_ID };
