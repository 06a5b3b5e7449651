/**
 * The explorer's state in its URL: the condition of the analysis and the
 * view (colour mode, held species, selected cycle and element), so that a
 * copied address reopens the same picture. Reading is forgiving (a bad value
 * falls back to its default and is reported); writing is canonical (fixed
 * parameter order), so equal states give equal URLs.
 *
 * Parameters: m (mechanism id), z (km), T (K), p (hPa), lat (°N),
 * date (YYYY-MM-DD), t (local solar time, h), sza (solar zenith angle, °;
 * replaces lat/date/t for the sun), mode (instantaneous | diurnal),
 * o3 (held | solved), total.<pool> and held.<species> (mixing ratio, mol/mol),
 * color (flux | ox), spectators (hide), cycle (cycle id), sel (element id),
 * detail (reactions drawn at most: one of DETAIL_LEVELS, "all" for every
 * reaction with flux; the default, 40, is left out).
 */
import { CONDITION_DEFAULTS, type ConditionInput } from "../atmosphere/condition";
import { DETAIL_DEFAULTS, DETAIL_LEVELS } from "./reactionDetail";
import type { ColorMode } from "./types";

export const EXPLORER_DEFAULTS = {
  /** default "reference" */
  mechanismId: "reference",
  /** km; default 30 */
  altitude_km: 30,
  /** the condition's defaults of the fields the URL always carries (lib/atmosphere/condition.ts) */
  latitude_deg: CONDITION_DEFAULTS.latitude_deg,
  date: CONDITION_DEFAULTS.date,
  localSolarTime_h: CONDITION_DEFAULTS.localSolarTime_h,
  mode: CONDITION_DEFAULTS.mode,
};

export interface ExplorerView {
  colorMode: ColorMode;
  /** draw held and third-body species */
  showHeld: boolean;
  /** id of the selected catalytic cycle */
  cycle: string | null;
  /** id of the inspected element ("s:ClO", "r:C3") */
  select: string | null;
  /** reactions drawn at most (reactionDetail's limit); Infinity draws every reaction with flux; default 40 */
  detail: number;
}

export interface ExplorerQuery {
  mechanismId: string;
  condition: ConditionInput;
  view: ExplorerView;
  /** parameters that were ignored, with why */
  warnings: string[];
}

type Params = URLSearchParams | Record<string, string | string[] | undefined>;

function getter(params: Params): { get(k: string): string | undefined; keys(): string[] } {
  if (params instanceof URLSearchParams) {
    return { get: (k) => params.get(k) ?? undefined, keys: () => [...new Set(params.keys())] };
  }
  return {
    get: (k) => {
      const v = params[k];
      return Array.isArray(v) ? v[0] : v;
    },
    keys: () => Object.keys(params),
  };
}

export function parseExplorerQuery(params: Params): ExplorerQuery {
  const q = getter(params);
  const warnings: string[] = [];
  const num = (key: string, lo: number, hi: number): number | undefined => {
    const raw = q.get(key);
    if (raw === undefined || raw === "") return undefined;
    const v = Number(raw);
    if (!Number.isFinite(v) || v < lo || v > hi) {
      warnings.push(`${key}=${raw} ignored: expected a number from ${lo} to ${hi}`);
      return undefined;
    }
    return v;
  };
  const D = EXPLORER_DEFAULTS;
  const condition: ConditionInput = { altitude_km: num("z", 0, 86) ?? D.altitude_km };
  const T = num("T", 150, 350);
  if (T !== undefined) condition.T_K = T;
  const p = num("p", 1e-6, 1100);
  if (p !== undefined) condition.p_hPa = p;
  const sza = num("sza", 0, 180);
  if (sza !== undefined) condition.zenith_deg = sza;
  condition.latitude_deg = num("lat", -90, 90) ?? D.latitude_deg;
  const date = q.get("date");
  if (date !== undefined && !/^\d{4}-\d{2}-\d{2}$/.test(date))
    warnings.push(`date=${date} ignored: expected YYYY-MM-DD`);
  condition.date = date && /^\d{4}-\d{2}-\d{2}$/.test(date) ? date : D.date;
  condition.localSolarTime_h = num("t", 0, 24) ?? D.localSolarTime_h;
  const mode = q.get("mode");
  if (mode !== undefined && mode !== "instantaneous" && mode !== "diurnal") warnings.push(`mode=${mode} ignored`);
  condition.mode = mode === "diurnal" ? "diurnal" : D.mode;
  const o3 = q.get("o3");
  if (o3 === "solved" || o3 === "held") condition.ozone = o3;
  const sad = num("sad", 0, 10000);
  if (sad !== undefined) condition.aerosolSurface_um2cm3 = sad;
  const cloud = q.get("cloud");
  if (cloud === "none" || cloud === "NAT" || cloud === "ice" || cloud === "auto") condition.cloud = cloud;
  else if (cloud !== undefined) warnings.push(`cloud=${cloud} ignored: expected none, NAT, ice or auto`);
  const csad = num("csad", 0, 10000);
  if (csad !== undefined) condition.cloudSurface_um2cm3 = csad;
  const albedo = num("alb", 0, 1);
  if (albedo !== undefined) condition.albedo = albedo;
  const aod = num("aod", 0, 10);
  if (aod !== undefined) condition.aerosolOpticalDepth = aod;
  for (const key of q.keys().sort()) {
    const m = /^(total|held)\.(.+)$/.exec(key);
    if (!m) continue;
    const v = num(key, 0, 1);
    if (v === undefined) continue;
    const field = m[1] === "total" ? "poolTotals" : "held";
    condition[field] = { ...(condition[field] ?? {}), [m[2]]: v };
  }
  const color = q.get("color");
  const detailRaw = q.get("detail");
  const detail = detailRaw === "all" ? Infinity : Number(detailRaw);
  const detailOk = (DETAIL_LEVELS as readonly number[]).includes(detail);
  if (detailRaw !== undefined && !detailOk)
    warnings.push(`detail=${detailRaw} ignored: expected one of ${DETAIL_LEVELS.map(detailParam).join(", ")}`);
  const view: ExplorerView = {
    colorMode: color === "ox" ? "ox" : "flux",
    showHeld: q.get("spectators") !== "hide",
    cycle: q.get("cycle") || null,
    select: q.get("sel") || null,
    detail: detailOk ? detail : DETAIL_DEFAULTS.limit,
  };
  const m = q.get("m");
  return { mechanismId: m && /^[\w.-]{1,80}$/.test(m) ? m : D.mechanismId, condition, view, warnings };
}

export function explorerQueryString(q: Omit<ExplorerQuery, "warnings">): string {
  const c = q.condition;
  const out = new URLSearchParams();
  out.set("m", q.mechanismId);
  out.set("z", String(c.altitude_km));
  if (c.T_K !== undefined) out.set("T", String(c.T_K));
  if (c.p_hPa !== undefined) out.set("p", String(c.p_hPa));
  if (c.zenith_deg !== undefined) out.set("sza", String(c.zenith_deg));
  out.set("lat", String(c.latitude_deg ?? EXPLORER_DEFAULTS.latitude_deg));
  out.set("date", c.date ?? EXPLORER_DEFAULTS.date);
  out.set("t", String(c.localSolarTime_h ?? EXPLORER_DEFAULTS.localSolarTime_h));
  out.set("mode", c.mode ?? EXPLORER_DEFAULTS.mode);
  if (c.ozone) out.set("o3", c.ozone);
  if (c.aerosolSurface_um2cm3 !== undefined) out.set("sad", String(c.aerosolSurface_um2cm3));
  if (c.cloud !== undefined) out.set("cloud", c.cloud);
  if (c.cloudSurface_um2cm3 !== undefined) out.set("csad", String(c.cloudSurface_um2cm3));
  if (c.albedo !== undefined) out.set("alb", String(c.albedo));
  if (c.aerosolOpticalDepth !== undefined) out.set("aod", String(c.aerosolOpticalDepth));
  for (const [k, v] of Object.entries(c.poolTotals ?? {}).sort(([a], [b]) => a.localeCompare(b)))
    out.set(`total.${k}`, String(v));
  for (const [k, v] of Object.entries(c.held ?? {}).sort(([a], [b]) => a.localeCompare(b)))
    out.set(`held.${k}`, String(v));
  if (q.view.colorMode !== "flux") out.set("color", q.view.colorMode);
  if (!q.view.showHeld) out.set("spectators", "hide");
  if (q.view.cycle) out.set("cycle", q.view.cycle);
  if (q.view.select) out.set("sel", q.view.select);
  if (q.view.detail !== DETAIL_DEFAULTS.limit) out.set("detail", detailParam(q.view.detail));
  return out.toString();
}

const detailParam = (n: number) => (Number.isFinite(n) ? String(n) : "all");
