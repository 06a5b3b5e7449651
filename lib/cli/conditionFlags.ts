/**
 * The condition and analysis options as command-line flags, and a condition
 * file (JSON or YAML) they override. Each flag names one field of
 * ConditionInput or AnalysisOptions (lib/engine/types.ts); the request is then
 * checked by the same schema as the routes'.
 */
import { type Command, InvalidArgumentError, Option } from "commander";
import { parse as parseYaml } from "yaml";
import { CONDITION_DEFAULTS } from "../atmosphere/condition";
import type { AnalysisOptions, ConditionInput } from "../engine/types";
import { integer, number } from "./argParsers";
import { CliError, type CliIo, readTextFile } from "./io";

/** `id=value` pairs, repeatable: --pool Cly=3.3e-9 --pool Bry=2e-11 */
const pairs = (v: string, previous: Record<string, number> = {}): Record<string, number> => {
  const m = /^([^=\s]+)=(.+)$/.exec(v);
  if (!m) throw new InvalidArgumentError(`expected id=value, got "${v}"`);
  return { ...previous, [m[1]]: number(m[2]) };
};

interface FlagSpec {
  flags: string;
  help: string;
  field: keyof ConditionInput;
  parse?: (v: string, previous: never) => unknown;
  choices?: string[];
  /** a per-level quantity that a sweep takes from its profile */
  levelOnly?: boolean;
}

const CONDITION_FLAGS: FlagSpec[] = [
  {
    flags: "--altitude <km>",
    help: "geometric altitude, km (0–86)",
    field: "altitude_km",
    parse: number,
    levelOnly: true,
  },
  {
    flags: "--temperature <K>",
    help: "temperature, K; default U.S. Standard Atmosphere 1976",
    field: "T_K",
    parse: number,
    levelOnly: true,
  },
  {
    flags: "--pressure <hPa>",
    help: "pressure, hPa; default U.S. Standard Atmosphere 1976",
    field: "p_hPa",
    parse: number,
    levelOnly: true,
  },
  {
    flags: "--latitude <deg>",
    help: `latitude, degrees north; default ${CONDITION_DEFAULTS.latitude_deg}`,
    field: "latitude_deg",
    parse: number,
  },
  { flags: "--date <YYYY-MM-DD>", help: `date; default "${CONDITION_DEFAULTS.date}"`, field: "date" },
  {
    flags: "--solar-time <h>",
    help: `local solar time, h (0–24); default ${CONDITION_DEFAULTS.localSolarTime_h}`,
    field: "localSolarTime_h",
    parse: number,
  },
  {
    flags: "--zenith <deg>",
    help: "solar zenith angle, degrees; overrides latitude, date and time for the sun",
    field: "zenith_deg",
    parse: number,
  },
  {
    flags: "--mode <mode>",
    help: "instantaneous steady state or the 24-hour periodic solution",
    field: "mode",
    choices: ["instantaneous", "diurnal"],
  },
  {
    flags: "--ozone <how>",
    help: `hold O3 at the climatology or solve for it; default ${CONDITION_DEFAULTS.ozone}`,
    field: "ozone",
    choices: ["held", "solved"],
  },
  {
    flags: "--held <species=ratio>",
    help: "held species mixing ratio, mol/mol (repeatable)",
    field: "held",
    parse: pairs,
  },
  {
    flags: "--pool <pool=ratio>",
    help: "pool total as a mixing ratio of its atoms, e.g. Cly=3.3e-9 (repeatable)",
    field: "poolTotals",
    parse: pairs,
  },
  {
    flags: "--photolysis <channel=rate>",
    help: "photolysis frequency override, s⁻¹ (repeatable)",
    field: "J",
    parse: pairs,
  },
  {
    flags: "--j-scale <factor>",
    help: `factor on every computed photolysis frequency; default ${CONDITION_DEFAULTS.jScale}`,
    field: "jScale",
    parse: number,
  },
  {
    flags: "--ozone-column <DU>",
    help: "ozone column above the level for the light, Dobson units",
    field: "o3ColumnAbove_DU",
    parse: number,
    levelOnly: true,
  },
  {
    flags: "--aerosol-surface <um2cm3>",
    help: "aerosol surface area density, µm² cm⁻³; default background sulfate",
    field: "aerosolSurface_um2cm3",
    parse: number,
    levelOnly: true,
  },
  {
    flags: "--albedo <fraction>",
    help: `ground albedo for the scattered light, 0–1; default ${CONDITION_DEFAULTS.albedo}`,
    field: "albedo",
    parse: number,
  },
  {
    flags: "--aerosol-depth <tau>",
    help: `aerosol optical depth of the column at 550 nm; default ${CONDITION_DEFAULTS.aerosolOpticalDepth}`,
    field: "aerosolOpticalDepth",
    parse: number,
  },
];

/** Adds the condition flags to `cmd`; a sweep leaves out the per-level ones (altitude, T, p, …). */
export function addConditionFlags(cmd: Command, forSweep = false): Command {
  for (const f of CONDITION_FLAGS) {
    if (forSweep && f.levelOnly) continue;
    const o = new Option(f.flags, f.help);
    if (f.choices) o.choices(f.choices);
    if (f.parse) o.argParser(f.parse as (v: string, previous: unknown) => unknown);
    cmd.addOption(o);
  }
  return cmd
    .option("--fmin <fraction>", "pathway significance threshold, fraction of the gross Ox loss; default 1e-4", number)
    .addOption(
      new Option("--ox-family <which>", "odd-oxygen family; default standard").choices(["standard", "extended"]),
    );
}

/** Adds the uncertainty options of a single analysis. */
export function addUncertaintyFlags(cmd: Command): Command {
  return cmd
    .option("--samples <n>", "Monte Carlo samples over the rate-constant uncertainties; default 0", integer)
    .option("--seed <n>", "seed of the Monte Carlo draws; default 1", integer)
    .option("--sensitivity", "normalised sensitivities d ln(output) / d ln(k) of the key outputs");
}

/** The condition from an optional file, with the flags given over it. */
export function conditionFromFlags(
  io: CliIo,
  flags: Record<string, unknown>,
  file: string | undefined,
): Partial<ConditionInput> {
  const base = file ? readConditionFile(io, file) : {};
  const out: Record<string, unknown> = { ...base };
  for (const f of CONDITION_FLAGS) {
    const v = flags[optionKey(f.flags)];
    if (v === undefined) continue;
    out[f.field] =
      typeof v === "object" && typeof out[f.field] === "object" ? { ...(out[f.field] as object), ...v } : v;
  }
  return out as Partial<ConditionInput>;
}

/** The analysis options given as flags (unset ones left out, so the engine's defaults apply). */
export function optionsFromFlags(flags: Record<string, unknown>): AnalysisOptions {
  const o: AnalysisOptions = {};
  if (flags.fmin !== undefined) o.fminRelative = flags.fmin as number;
  if (flags.oxFamily !== undefined) o.oxDefinition = flags.oxFamily as AnalysisOptions["oxDefinition"];
  if (flags.samples !== undefined) o.uncertaintySamples = flags.samples as number;
  if (flags.seed !== undefined) o.uncertaintySeed = flags.seed as number;
  if (flags.sensitivity) o.sensitivity = true;
  return o;
}

/** commander's attribute name of a flag: "--solar-time <h>" → "solarTime". */
function optionKey(flags: string): string {
  const long = flags.split(/[ ,]/).find((s) => s.startsWith("--")) ?? "";
  return long.slice(2).replace(/-([a-z])/g, (_, c: string) => c.toUpperCase());
}

/** A condition file: one JSON or YAML object of ConditionInput fields. */
function readConditionFile(io: CliIo, file: string): Record<string, unknown> {
  const text = readTextFile(io, file, "condition file");
  let data: unknown;
  try {
    data = parseYaml(text);
  } catch (e) {
    const first = ((e as Error).message ?? "").split("\n")[0];
    throw new CliError(`condition file ${file} is not valid JSON or YAML: ${first}`);
  }
  if (!data || typeof data !== "object" || Array.isArray(data)) {
    throw new CliError(`condition file ${file} must hold one object of condition fields (altitude_km, T_K, …)`);
  }
  return data as Record<string, unknown>;
}
