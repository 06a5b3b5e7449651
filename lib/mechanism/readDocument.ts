/**
 * Checks the shape of a parsed mechanism document (plain data from YAML or
 * JSON) and returns it typed. Every problem is reported with its document
 * path; entries with errors are left out so that later checks can go on and
 * report everything at once. Field names: docs/mechanism-format.md.
 */
import type { Uncertainty } from "../kinetics/types";
import type { DiagnosticSink, DocPath } from "./diagnostics";
import type { MechanismDocument, RateEntry, ReactionEntry, SpeciesEntry, TotalEntry } from "./types";

type Obj = Record<string, unknown>;

const TOP_KEYS = ["title", "version", "description", "species", "totals", "reactions"];
const SPECIES_KEYS = ["id", "role", "label", "group", "atoms", "mixingRatio", "numberDensity_cm3", "note"];
const TOTAL_KEYS = ["id", "element", "label", "mixingRatio", "numberDensity_cm3", "note"];
const REACTION_KEYS = ["id", "equation", "rate", "uncertainty", "source", "note", "unbalanced"];
const ROLES = ["solved", "held", "third-body"];

/** Parameters of each law: [required, optional]. */
export const LAW_PARAMETERS: Record<RateEntry["law"], [string[], string[]]> = {
  arrhenius: [["A"], ["E/R", "b"]],
  termolecular: [["k0"], ["n", "kinf", "m", "Fc"]],
  "chemical-activation": [
    ["k0", "kinf"],
    ["n", "m", "Fc"],
  ],
  lindemann: [["low", "high"], []],
  "equilibrium-reverse": [["forward", "K"], []],
  photolysis: [[], ["channel", "factor", "J"]],
  uptake: [["gamma"], ["surface"]],
  "liquid-aerosol": [["process"], ["radius_um"]],
};
/** Surfaces an uptake law may name (lib/kinetics `SurfaceKind`). */
export const SURFACES = ["sulfate", "nat", "ice"] as const;
/** Processes of the liquid-aerosol law (Shi et al. 2001 parameterisation, lib/kinetics/sulfateGamma.ts). */
export const LIQUID_AEROSOL_PROCESSES = ["ClONO2+H2O", "ClONO2+HCl", "HOCl+HCl"] as const;
const LAWS = Object.keys(LAW_PARAMETERS);
/** Accepted spellings with the JPL symbols. */
const ALIASES: Record<string, string> = { "k∞": "kinf", "f(298)": "f298" };

const isObj = (v: unknown): v is Obj => typeof v === "object" && v !== null && !Array.isArray(v);
const kind = (v: unknown): string =>
  v === null
    ? "null"
    : Array.isArray(v)
      ? "a list"
      : typeof v === "object"
        ? "a mapping"
        : `${typeof v} ${JSON.stringify(v)}`;

class Reader {
  constructor(private readonly sink: DiagnosticSink) {}

  keys(o: Obj, path: DocPath, allowed: string[], what: string, law?: string): Obj {
    const out: Obj = {};
    for (const [k0, v] of Object.entries(o)) {
      const k = ALIASES[k0] ?? k0;
      if (!allowed.includes(k)) {
        if (law) {
          const params = allowed.filter((a) => a !== "law").join(", ");
          this.sink.error(
            [...path, k0],
            "unknown-parameter",
            `unknown parameter "${k0}" for the ${law} law; its parameters are ${params}`,
            true,
          );
        } else {
          this.sink.error(
            [...path, k0],
            "unknown-key",
            `unknown field "${k0}" in ${what}; expected one of ${allowed.join(", ")}`,
            true,
          );
        }
      } else if (k in out) {
        this.sink.error([...path, k0], "duplicate-key", `"${k0}" is given twice (also as "${k}")`, true);
      } else out[k] = v;
    }
    return out;
  }

  string(o: Obj, key: string, path: DocPath, required: boolean): string | undefined {
    const v = o[key];
    if (v === undefined || v === null) {
      if (required) this.sink.error([...path, key], "missing", `missing required field "${key}"`);
      return undefined;
    }
    if (typeof v === "number" && key === "version") return String(v);
    if (typeof v !== "string") {
      this.sink.error([...path, key], "type", `expected text, found ${kind(v)}`);
      return undefined;
    }
    if (required && v.trim() === "") {
      this.sink.error([...path, key], "empty", `"${key}" must not be empty`);
      return undefined;
    }
    return v;
  }

  number(
    o: Obj,
    key: string,
    path: DocPath,
    opts: { required?: boolean; positive?: boolean; nonNegative?: boolean } = {},
  ): number | undefined {
    const v = o[key];
    const p = [...path, key];
    if (v === undefined || v === null) {
      if (opts.required) this.sink.error(p, "missing", `missing required parameter "${key}"`);
      return undefined;
    }
    const want = opts.positive ? "a positive number" : opts.nonNegative ? "a number ≥ 0" : "a number";
    if (typeof v !== "number" || !Number.isFinite(v)) {
      this.sink.error(p, "type", `expected ${want}, found ${kind(v)}`);
      return undefined;
    }
    if ((opts.positive && !(v > 0)) || (opts.nonNegative && v < 0)) {
      this.sink.error(p, "range", `expected ${want}, found ${v}`);
      return undefined;
    }
    return v;
  }

  /** A text field that must be one of `options`. */
  choice<T extends string>(o: Obj, key: string, path: DocPath, options: readonly T[], required = false): T | undefined {
    const v = o[key];
    if (v === undefined || v === null) {
      if (required)
        this.sink.error([...path, key], "missing", `missing required parameter "${key}"; one of ${options.join(", ")}`);
      return undefined;
    }
    if (typeof v !== "string" || !options.includes(v as T)) {
      this.sink.error([...path, key], "range", `${key} must be one of ${options.join(", ")}, found ${kind(v)}`);
      return undefined;
    }
    return v as T;
  }

  list(o: Obj, key: string, path: DocPath, required: boolean): unknown[] {
    const v = o[key];
    if (v === undefined || v === null) {
      if (required) this.sink.error([...path, key], "missing", `missing required list "${key}"`);
      return [];
    }
    if (!Array.isArray(v)) {
      this.sink.error([...path, key], "type", `expected a list, found ${kind(v)}`);
      return [];
    }
    return v;
  }

  amount(o: Obj, path: DocPath, target: { mixingRatio?: number; numberDensity_cm3?: number }): void {
    const x = this.number(o, "mixingRatio", path, { nonNegative: true });
    const n = this.number(o, "numberDensity_cm3", path, { nonNegative: true });
    if (x !== undefined && n !== undefined) {
      this.sink.error(
        [...path, "numberDensity_cm3"],
        "amount",
        "give either mixingRatio or numberDensity_cm3, not both",
      );
      return;
    }
    if (x !== undefined) {
      if (x > 1)
        this.sink.error([...path, "mixingRatio"], "range", `a mixing ratio is at most 1 (mol/mol), found ${x}`);
      else target.mixingRatio = x;
    }
    if (n !== undefined) target.numberDensity_cm3 = n;
  }

  species(v: unknown, path: DocPath): SpeciesEntry | undefined {
    if (!isObj(v)) {
      this.sink.error(path, "type", `expected a species mapping (id, role, …), found ${kind(v)}`);
      return undefined;
    }
    const o = this.keys(v, path, SPECIES_KEYS, "a species");
    const id = this.string(o, "id", path, true);
    const role = this.string(o, "role", path, true);
    if (role !== undefined && !ROLES.includes(role)) {
      this.sink.error([...path, "role"], "role", `unknown role "${role}"; expected one of ${ROLES.join(", ")}`);
      return undefined;
    }
    if (id === undefined || role === undefined) return undefined;
    const entry: SpeciesEntry = { id: id.trim(), role: role as SpeciesEntry["role"] };
    const label = this.string(o, "label", path, false);
    if (label !== undefined) entry.label = label;
    const group = this.string(o, "group", path, false);
    if (group !== undefined) entry.group = group;
    const note = this.string(o, "note", path, false);
    if (note !== undefined) entry.note = note;
    if (o.atoms !== undefined) {
      const atoms = o.atoms;
      if (!isObj(atoms))
        this.sink.error([...path, "atoms"], "type", `expected a mapping element → count, found ${kind(atoms)}`);
      else {
        const a: Record<string, number> = {};
        for (const el of Object.keys(atoms)) {
          const n = this.number(atoms, el, [...path, "atoms"], { nonNegative: true });
          if (n !== undefined && n > 0) a[el] = n;
        }
        entry.atoms = a;
      }
    }
    this.amount(o, path, entry);
    return entry;
  }

  total(v: unknown, path: DocPath): TotalEntry | undefined {
    if (!isObj(v)) {
      this.sink.error(path, "type", `expected a total mapping (id, element, …), found ${kind(v)}`);
      return undefined;
    }
    const o = this.keys(v, path, TOTAL_KEYS, "a total");
    const id = this.string(o, "id", path, true);
    const element = this.string(o, "element", path, true);
    if (id === undefined || element === undefined) return undefined;
    const entry: TotalEntry = { id: id.trim(), element: element.trim() };
    const label = this.string(o, "label", path, false);
    if (label !== undefined) entry.label = label;
    const note = this.string(o, "note", path, false);
    if (note !== undefined) entry.note = note;
    this.amount(o, path, entry);
    return entry;
  }

  rate(v: unknown, path: DocPath, nested = false): RateEntry | undefined {
    if (!isObj(v)) {
      this.sink.error(path, "type", `expected a rate mapping with "law" and its parameters, found ${kind(v)}`);
      return undefined;
    }
    const law = v.law;
    if (typeof law !== "string" || !LAWS.includes(law)) {
      this.sink.error(
        [...path, "law"],
        "unknown-law",
        law === undefined
          ? `missing "law"; expected one of ${LAWS.join(", ")}`
          : `unknown rate law ${JSON.stringify(law)}; expected one of ${LAWS.join(", ")}`,
      );
      return undefined;
    }
    const [req, opt] = LAW_PARAMETERS[law as RateEntry["law"]];
    const o = this.keys(v, path, ["law", ...req, ...opt], `a ${law} rate`, law);
    const before = this.sink.errorCount;
    const num = (k: string, positive = false) => this.number(o, k, path, { required: req.includes(k), positive });
    let out: RateEntry | undefined;
    switch (law) {
      case "arrhenius":
        out = { law, A: num("A", true)!, "E/R": num("E/R"), b: num("b") };
        break;
      case "termolecular":
        out = { law, k0: num("k0", true)!, n: num("n"), kinf: num("kinf", true), m: num("m"), Fc: num("Fc", true) };
        break;
      case "chemical-activation":
        out = { law, k0: num("k0", true)!, n: num("n"), kinf: num("kinf", true)!, m: num("m"), Fc: num("Fc", true) };
        break;
      case "uptake": {
        const gamma = num("gamma", true);
        const surface = this.choice(o, "surface", path, SURFACES);
        if (gamma !== undefined && gamma > 1)
          this.sink.error([...path, "gamma"], "range", `gamma is an uptake probability in (0, 1], found ${gamma}`);
        else if (gamma !== undefined) out = surface ? { law, gamma, surface } : { law, gamma };
        break;
      }
      case "liquid-aerosol": {
        const process = this.choice(o, "process", path, LIQUID_AEROSOL_PROCESSES, true);
        const radius_um = num("radius_um", true);
        if (process) out = radius_um === undefined ? { law, process } : { law, process, radius_um };
        break;
      }
      case "lindemann": {
        const limit = (k: "low" | "high") => {
          const v = o[k];
          if (!isObj(v)) {
            this.sink.error(
              [...path, k],
              v === undefined ? "missing" : "type",
              `expected a mapping {A, E/R} for the ${k}-pressure limit, found ${kind(v)}`,
            );
            return undefined;
          }
          const q = this.keys(v, [...path, k], ["A", "E/R"], `the ${k}-pressure limit`);
          const A = this.number(q, "A", [...path, k], { required: true, positive: true });
          const E = this.number(q, "E/R", [...path, k]);
          return A === undefined ? undefined : { A, "E/R": E ?? 0 };
        };
        const low = limit("low");
        const high = limit("high");
        if (low && high) out = { law, low, high };
        break;
      }
      case "equilibrium-reverse": {
        let forward: string | RateEntry | undefined;
        if (typeof o.forward === "string") forward = o.forward;
        else if (nested)
          this.sink.error(
            [...path, "forward"],
            "type",
            "the forward law of a reverse rate cannot itself be a reverse rate",
          );
        else if (o.forward !== undefined) {
          forward = this.rate(o.forward, [...path, "forward"], true);
          if (
            forward?.law === "equilibrium-reverse" ||
            forward?.law === "photolysis" ||
            forward?.law === "uptake" ||
            forward?.law === "liquid-aerosol"
          ) {
            this.sink.error(
              [...path, "forward", "law"],
              "type",
              `the forward law of a reverse rate must be thermal, found ${forward.law}`,
            );
          }
        } else
          this.sink.error(
            [...path, "forward"],
            "missing",
            'missing "forward": the id of the forward reaction or its rate',
          );
        let K: { A: number; B: number } | undefined;
        if (isObj(o.K)) {
          const k = this.keys(o.K, [...path, "K"], ["A", "B"], "an equilibrium constant K = A exp(B/T)");
          const A = this.number(k, "A", [...path, "K"], { required: true, positive: true });
          const B = this.number(k, "B", [...path, "K"], { required: true });
          if (A !== undefined && B !== undefined) K = { A, B };
        } else if (o.K !== undefined)
          this.sink.error([...path, "K"], "type", `expected a mapping {A, B}, found ${kind(o.K)}`);
        else this.sink.error([...path, "K"], "missing", 'missing "K": the equilibrium constant {A (cm³), B (K)}');
        if (forward !== undefined && K !== undefined) out = { law, forward, K };
        break;
      }
      case "photolysis": {
        const channel = this.string(o, "channel", path, false);
        const J = this.number(o, "J", path, { nonNegative: true });
        const factor = this.number(o, "factor", path, { nonNegative: true });
        if (channel !== undefined && J !== undefined) {
          this.sink.error(
            [...path, "J"],
            "photolysis",
            'give either "channel" (computed J) or "J" (fixed, s⁻¹), not both',
          );
        } else if (channel === undefined && J === undefined) {
          this.sink.error(path, "photolysis", 'a photolysis rate needs "channel" (computed J) or "J" (fixed, s⁻¹)');
        } else if (J !== undefined && factor !== undefined) {
          this.sink.error(
            [...path, "factor"],
            "photolysis",
            '"factor" applies to a channel; fold it into the fixed "J"',
          );
        } else out = { law, channel, J, factor };
        break;
      }
    }
    if (this.sink.errorCount > before || !out) return undefined;
    const clean = out as Record<string, unknown>;
    for (const k of Object.keys(clean)) if (clean[k] === undefined) delete clean[k];
    return out;
  }

  uncertainty(v: unknown, path: DocPath): Uncertainty | undefined {
    if (!isObj(v)) {
      this.sink.error(path, "type", `expected a mapping {f298, g}, found ${kind(v)}`);
      return undefined;
    }
    const o = this.keys(v, path, ["f298", "g"], "an uncertainty (f(T) = f298 exp|g (1/T − 1/298)|)");
    const f298 = this.number(o, "f298", path, { required: true, positive: true });
    const g = this.number(o, "g", path, { nonNegative: true }) ?? 0;
    if (f298 === undefined) return undefined;
    if (f298 < 1) {
      this.sink.error([...path, "f298"], "range", `an uncertainty factor is at least 1, found ${f298}`);
      return undefined;
    }
    return { f298, g };
  }

  reaction(v: unknown, path: DocPath): ReactionEntry | undefined {
    if (!isObj(v)) {
      this.sink.error(path, "type", `expected a reaction mapping (id, equation, rate, …), found ${kind(v)}`);
      return undefined;
    }
    const o = this.keys(v, path, REACTION_KEYS, "a reaction");
    const id = this.string(o, "id", path, true);
    const equation = this.string(o, "equation", path, true);
    let rate: RateEntry | undefined;
    if (o.rate === undefined) this.sink.error([...path, "rate"], "missing", 'missing required field "rate"');
    else rate = this.rate(o.rate, [...path, "rate"]);
    const uncertainty =
      o.uncertainty === undefined ? undefined : this.uncertainty(o.uncertainty, [...path, "uncertainty"]);
    const source = this.string(o, "source", path, false);
    const note = this.string(o, "note", path, false);
    const unbalanced = this.string(o, "unbalanced", path, false);
    if (unbalanced !== undefined && unbalanced.trim() === "") {
      this.sink.error([...path, "unbalanced"], "empty", '"unbalanced" needs the reason (e.g. "lumped products")');
    }
    if (id === undefined || equation === undefined || rate === undefined) return undefined;
    const entry: ReactionEntry = { id: id.trim(), equation, rate };
    if (uncertainty) entry.uncertainty = uncertainty;
    if (source !== undefined) entry.source = source;
    if (note !== undefined) entry.note = note;
    if (unbalanced !== undefined && unbalanced.trim() !== "") entry.unbalanced = unbalanced;
    return entry;
  }
}

export interface ReadLimits {
  maxSpecies: number;
  maxReactions: number;
}

export interface ReadResult {
  doc: MechanismDocument;
  /** Index in the document of each kept entry (entries with errors are left out). */
  at: { species: number[]; totals: number[]; reactions: number[] };
  /** ids of species left out for errors (their use in equations is not reported again) */
  droppedSpecies: Set<string>;
}

/**
 * The typed document, or undefined when its top level is unusable. Counts
 * beyond `limits` are reported as "too-large" and stop the reading.
 */
export function readDocument(data: unknown, sink: DiagnosticSink, limits: ReadLimits): ReadResult | undefined {
  if (!isObj(data)) {
    sink.error(
      [],
      "type",
      `a mechanism document is a mapping with title, version, species and reactions; found ${kind(data)}`,
    );
    return undefined;
  }
  const r = new Reader(sink);
  const o = r.keys(data, [], TOP_KEYS, "the document");
  const speciesRaw = r.list(o, "species", [], true);
  const reactionsRaw = r.list(o, "reactions", [], true);
  if (speciesRaw.length > limits.maxSpecies) {
    sink.error(["species"], "too-large", `${speciesRaw.length} species exceed the limit of ${limits.maxSpecies}`);
  }
  if (reactionsRaw.length > limits.maxReactions) {
    sink.error(
      ["reactions"],
      "too-large",
      `${reactionsRaw.length} reactions exceed the limit of ${limits.maxReactions}`,
    );
  }
  if (speciesRaw.length > limits.maxSpecies || reactionsRaw.length > limits.maxReactions) return undefined;
  const doc: MechanismDocument = {
    title: r.string(o, "title", [], true) ?? "",
    version: r.string(o, "version", [], true) ?? "",
    description: r.string(o, "description", [], false) ?? "",
    species: [],
    totals: [],
    reactions: [],
  };
  const at: ReadResult["at"] = { species: [], totals: [], reactions: [] };
  const droppedSpecies = new Set<string>();
  speciesRaw.forEach((v, i) => {
    const s = r.species(v, ["species", i]);
    if (s) {
      doc.species.push(s);
      at.species.push(i);
    } else if (isObj(v) && typeof v.id === "string") droppedSpecies.add(v.id.trim());
  });
  r.list(o, "totals", [], false).forEach((v, i) => {
    const t = r.total(v, ["totals", i]);
    if (t) {
      doc.totals.push(t);
      at.totals.push(i);
    }
  });
  reactionsRaw.forEach((v, i) => {
    const x = r.reaction(v, ["reactions", i]);
    if (x) {
      doc.reactions.push(x);
      at.reactions.push(i);
    }
  });
  return { doc, at, droppedSpecies };
}
