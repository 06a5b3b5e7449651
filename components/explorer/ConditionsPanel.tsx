"use client";
/**
 * Where and when: mechanism, altitude (T and p from the 1976 standard
 * atmosphere unless overridden), the sun (latitude, date, local time, or a
 * zenith angle), instantaneous or 24-hour, and the amounts held.
 */
import { backgroundSulfateSurface_um2cm3 } from "@/lib/atmosphere/backgroundAerosol";
import { CONDITION_DEFAULTS, type ConditionInput, type ResolvedCondition } from "@/lib/atmosphere/condition";
import { CLOUD_DEFAULTS, type CloudType } from "@/lib/atmosphere/polarCloud";
import { standardAtmosphere } from "@/lib/atmosphere/standardAtmosphere";
import { DEMO_CONDITIONS } from "@/lib/engine/demoConditions";
import { ALTITUDE_SLIDER } from "@/lib/viz/altitudeNeighbours";
import { formatNumber } from "@/lib/viz/formatNumber";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";
import { NumberField } from "../NumberField";
import type { Problem } from "../ui/apiClient";
import { MechanismPicker } from "./MechanismPicker";
import { Panel } from "./Panel";

/** Amount fields offered when the mechanism has them: id, kind, display unit and factor to mol/mol. */
const AMOUNTS: { id: string; kind: "pool" | "held"; unit: string; factor: number; label: string }[] = [
  { id: "Cly", kind: "pool", unit: "ppbv", factor: 1e-9, label: "Cly" },
  { id: "Bry", kind: "pool", unit: "pptv", factor: 1e-12, label: "Bry" },
  { id: "NOy", kind: "pool", unit: "ppbv", factor: 1e-9, label: "NOy" },
  { id: "H2O", kind: "held", unit: "ppmv", factor: 1e-6, label: "H2O" },
  { id: "CH4", kind: "held", unit: "ppmv", factor: 1e-6, label: "CH4" },
];

interface Props {
  mechanisms: MechanismSummary[];
  mechanismId: string;
  mechanism: MechanismView | null;
  onMechanism(id: string): void;
  onUploaded(m: { id: string; title: string; warnings: Problem[] }): void;
  condition: ConditionInput;
  onCondition(c: ConditionInput): void;
  /** the condition as the last analysis resolved it (defaults filled) */
  resolved: ResolvedCondition | null;
  /** error message by condition field ("T_K", "poolTotals.Cly", …) */
  fieldErrors: Record<string, string>;
}

const sig = (v: number, d = 4) => Number(v.toPrecision(d));

/** The condition's number fields a NumberField edits directly (same unit in the form and the request). */
type NumberKey =
  | "T_K"
  | "p_hPa"
  | "latitude_deg"
  | "aerosolSurface_um2cm3"
  | "cloudSurface_um2cm3"
  | "albedo"
  | "aerosolOpticalDepth";

/** What differs between those fields: the rest (value, change, error) follows from the key. */
interface NumberFieldSpec {
  id: string;
  label: string;
  unit: string;
  placeholder?: string;
  hint?: string;
}

/** The cloud the last analysis used and the temperatures that decided it. */
function cloudLine(cloud: NonNullable<ResolvedCondition["cloud"]>): string {
  const t = (v: number | null) => (v === null ? "n/a" : `${v.toFixed(1)} K`);
  const area =
    cloud.present === "NAT"
      ? `, ${cloud.natSurface_um2cm3} µm² cm⁻³`
      : cloud.present === "ice"
        ? `, ${cloud.iceSurface_um2cm3} µm² cm⁻³`
        : "";
  return `Cloud used: ${cloud.present}${area}. T_NAT ${t(cloud.T_NAT_K)}, frost point ${t(cloud.frostPoint_K)}.`;
}

export function ConditionsPanel(p: Props) {
  const c = p.condition;
  const set = (patch: Partial<ConditionInput>) => {
    const next = { ...c, ...patch };
    for (const k of Object.keys(patch) as (keyof ConditionInput)[]) if (patch[k] === undefined) delete next[k];
    p.onCondition(next);
  };
  const numberField = (key: NumberKey, spec: NumberFieldSpec) => (
    <NumberField {...spec} value={c[key]} onChange={(v) => set({ [key]: v })} error={p.fieldErrors[key]} />
  );
  const std = standardOrNull(c.altitude_km);
  const bySun = c.zenith_deg === undefined;
  const M = p.resolved?.M_cm3;
  const pools = new Set(p.mechanism?.pools.map((x) => x.id) ?? []);
  const held = new Set(p.mechanism?.species.filter((s) => s.role === "held").map((s) => s.id) ?? []);
  const amounts = AMOUNTS.filter((a) => (a.kind === "pool" ? pools.has(a.id) : held.has(a.id)));
  const setAmount = (a: (typeof AMOUNTS)[number], v: number | undefined) => {
    const key = a.kind === "pool" ? "poolTotals" : "held";
    const rec = { ...(c[key] ?? {}) };
    if (v === undefined) delete rec[a.id];
    else rec[a.id] = sig(v * a.factor, 6);
    set({ [key]: Object.keys(rec).length ? rec : undefined });
  };

  return (
    <Panel title="Conditions" id="conditions-title" className="flex min-h-0 flex-col">
      <form
        className="min-h-0 space-y-3 overflow-y-auto px-3 py-2"
        onSubmit={(e) => e.preventDefault()}
        aria-label="Conditions"
      >
        <div className="flex flex-col gap-0.5 text-[12px]">
          <label htmlFor="example" className="text-stone-600">
            Example condition
          </label>
          <select
            id="example"
            value=""
            onChange={(e) => {
              const demo = DEMO_CONDITIONS.find((d) => d.id === e.target.value);
              if (!demo) return;
              if (demo.mechanismId !== p.mechanismId) p.onMechanism(demo.mechanismId);
              p.onCondition({ ...demo.condition });
            }}
            className="rounded border border-stone-300 bg-white px-1 py-0.5 focus:outline-2 focus:outline-stone-800"
          >
            <option value="">choose…</option>
            {DEMO_CONDITIONS.map((d) => (
              <option key={d.id} value={d.id} title={d.description}>
                {d.label}
              </option>
            ))}
          </select>
        </div>

        <MechanismPicker
          mechanisms={p.mechanisms}
          mechanismId={p.mechanismId}
          mechanism={p.mechanism}
          onMechanism={p.onMechanism}
          onUploaded={p.onUploaded}
        />

        <fieldset className="space-y-2">
          <legend className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">
            Place in the atmosphere
          </legend>
          <div>
            <label htmlFor="altitude" className="flex items-baseline justify-between text-[12px] text-stone-600">
              <span>Altitude</span>
              <span className="tabular-nums text-[13px] font-semibold text-stone-900">
                <output htmlFor="altitude" data-testid="altitude-value">
                  {c.altitude_km}
                </output>{" "}
                km
              </span>
            </label>
            <input
              id="altitude"
              type="range"
              min={ALTITUDE_SLIDER.min_km}
              max={ALTITUDE_SLIDER.max_km}
              step={ALTITUDE_SLIDER.step_km}
              value={Math.min(ALTITUDE_SLIDER.max_km, c.altitude_km)}
              onChange={(e) => set({ altitude_km: Number(e.target.value) })}
              className="mt-1 w-full accent-stone-800"
              aria-valuetext={`${c.altitude_km} kilometres`}
            />
            <div className="flex justify-between text-[10px] text-stone-500" aria-hidden>
              <span>0</span>
              <span>15</span>
              <span>30</span>
              <span>45</span>
              <span>60 km</span>
            </div>
            {p.fieldErrors.altitude_km ? (
              <p role="alert" className="text-[11px] text-red-700">
                {p.fieldErrors.altitude_km}
              </p>
            ) : null}
          </div>
          <div className="grid grid-cols-2 gap-2">
            {numberField("T_K", {
              id: "temperature",
              label: "Temperature",
              unit: "K",
              placeholder: std ? `${sig(std.T_K)} (std)` : "standard",
            })}
            {numberField("p_hPa", {
              id: "pressure",
              label: "Pressure",
              unit: "hPa",
              placeholder: std ? `${sig(std.p_hPa)} (std)` : "standard",
            })}
          </div>
          <p className="text-[11px] text-stone-500">
            Empty fields use the U.S. Standard Atmosphere 1976 at this altitude
            {std ? `; air density ${formatNumber(std.M_cm3)} cm⁻³` : ""}.
          </p>
          {numberField("aerosolSurface_um2cm3", {
            id: "aerosol",
            label: "Sulfate aerosol surface",
            unit: "µm² cm⁻³",
            placeholder: Number.isFinite(c.altitude_km)
              ? `${sig(backgroundSulfateSurface_um2cm3(c.altitude_km))} (background)`
              : "background",
            hint: "For the reactions on liquid sulfate (N2O5, BrONO2, ClONO2, HOCl); 10–100 after a large eruption.",
          })}
          <div className="grid grid-cols-2 gap-2">
            <div className="flex flex-col gap-0.5 text-[12px]">
              <label htmlFor="cloud" className="text-stone-600">
                Polar cloud
              </label>
              <select
                id="cloud"
                value={c.cloud ?? CONDITION_DEFAULTS.cloud}
                onChange={(e) => {
                  const v = e.target.value as CloudType;
                  set({ cloud: v === CONDITION_DEFAULTS.cloud ? undefined : v });
                }}
                className="rounded border border-stone-300 bg-white px-1 py-0.5 focus:outline-2 focus:outline-stone-800"
              >
                <option value="none">none</option>
                <option value="auto">automatic</option>
                <option value="NAT">NAT</option>
                <option value="ice">ice</option>
              </select>
            </div>
            {numberField("cloudSurface_um2cm3", {
              id: "cloud-surface",
              label: "Cloud surface",
              unit: "µm² cm⁻³",
              placeholder: "default",
              hint: `Default NAT ${CLOUD_DEFAULTS.natSurface_um2cm3}, ice ${CLOUD_DEFAULTS.iceSurface_um2cm3}. Automatic: ice below the frost point, NAT below T_NAT.`,
            })}
          </div>
          {p.resolved?.cloud ? (
            <p className="text-[11px] text-stone-500" data-testid="cloud-state">
              {cloudLine(p.resolved.cloud)}
            </p>
          ) : null}
        </fieldset>

        <fieldset className="space-y-2">
          <legend className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">Light</legend>
          <div className="grid grid-cols-2 gap-2">
            {numberField("albedo", {
              id: "albedo",
              label: "Ground albedo",
              unit: "",
              placeholder: String(CONDITION_DEFAULTS.albedo),
            })}
            {numberField("aerosolOpticalDepth", {
              id: "aod",
              label: "Aerosol optical depth",
              unit: "550 nm",
              placeholder: String(CONDITION_DEFAULTS.aerosolOpticalDepth),
            })}
          </div>
          <p className="text-[11px] text-stone-500">
            Scattered and reflected light from a two-stream column; 0.05–0.1 for sea or forest, 0.6–0.9 over snow or
            thick cloud.
          </p>
        </fieldset>

        <fieldset className="space-y-2">
          <legend className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">Sun</legend>
          <div className="flex gap-3 text-[12px]" role="radiogroup" aria-label="Sun position from">
            <label className="flex items-center gap-1">
              <input type="radio" name="sun" checked={bySun} onChange={() => set({ zenith_deg: undefined })} />
              place and time
            </label>
            <label className="flex items-center gap-1">
              <input
                type="radio"
                name="sun"
                checked={!bySun}
                onChange={() => set({ zenith_deg: sig(p.resolved?.zenith_deg ?? 45, 3) })}
              />
              zenith angle
            </label>
          </div>
          {bySun ? (
            <>
              <div className="grid grid-cols-2 gap-2">
                {numberField("latitude_deg", {
                  id: "latitude",
                  label: "Latitude",
                  unit: "°N",
                  placeholder: String(CONDITION_DEFAULTS.latitude_deg),
                })}
                <div>
                  <label htmlFor="date" className="text-[12px] text-stone-600">
                    Date
                  </label>
                  <input
                    id="date"
                    type="date"
                    value={c.date ?? ""}
                    onChange={(e) => set({ date: e.target.value || undefined })}
                    className="mt-0.5 w-full rounded border border-stone-300 bg-white px-1 py-[3px] text-[13px] focus:outline-2 focus:outline-stone-800"
                  />
                  {p.fieldErrors.date ? (
                    <p role="alert" className="text-[11px] text-red-700">
                      {p.fieldErrors.date}
                    </p>
                  ) : null}
                </div>
              </div>
              {c.mode !== "diurnal" ? (
                <div>
                  <label htmlFor="time" className="flex items-baseline justify-between text-[12px] text-stone-600">
                    <span>Local solar time</span>
                    <span className="tabular-nums font-semibold text-stone-900">
                      {formatTime(c.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h)}
                    </span>
                  </label>
                  <input
                    id="time"
                    type="range"
                    min={0}
                    max={24}
                    step={0.25}
                    value={c.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h}
                    onChange={(e) => set({ localSolarTime_h: Number(e.target.value) })}
                    className="w-full accent-stone-800"
                    aria-valuetext={formatTime(c.localSolarTime_h ?? CONDITION_DEFAULTS.localSolarTime_h)}
                  />
                </div>
              ) : null}
              {p.resolved && c.mode !== "diurnal" ? (
                <p className="min-h-[2.6em] text-[11px] text-stone-500">
                  Solar zenith angle {sig(p.resolved.zenith_deg, 3)}°
                  {p.resolved.zenith_deg >= 90 ? " (sun below the horizon)" : ""}; ozone column above{" "}
                  {sig(p.resolved.o3ColumnAbove_DU, 3)} DU.
                </p>
              ) : null}
            </>
          ) : (
            <NumberField
              id="zenith"
              label="Solar zenith angle"
              unit="°"
              value={c.zenith_deg}
              onChange={(v) => set({ zenith_deg: v ?? 45 })}
              error={p.fieldErrors.zenith_deg}
              hint="0° = sun overhead; above 90° = night."
            />
          )}
          <div className="flex gap-3 text-[12px]" role="radiogroup" aria-label="Averaging">
            <label className="flex items-center gap-1">
              <input
                type="radio"
                name="mode"
                checked={c.mode !== "diurnal"}
                onChange={() => set({ mode: "instantaneous" })}
              />
              instantaneous
            </label>
            <label className="flex items-center gap-1">
              <input
                type="radio"
                name="mode"
                checked={c.mode === "diurnal"}
                onChange={() => set({ mode: "diurnal" })}
              />
              24-hour average
            </label>
          </div>
        </fieldset>

        <fieldset className="space-y-2">
          <legend className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">Amounts held</legend>
          {amounts.length === 0 ? (
            <p className="text-[11px] text-stone-500">This mechanism holds no pool totals.</p>
          ) : null}
          <div className="grid grid-cols-2 gap-2">
            {amounts.map((a) => {
              const key = a.kind === "pool" ? "poolTotals" : "held";
              const mr = c[key]?.[a.id];
              const used = a.kind === "pool" ? p.resolved?.poolTotals_cm3[a.id] : p.resolved?.held_cm3[a.id];
              return (
                <NumberField
                  key={a.id}
                  id={`amount-${a.id}`}
                  label={a.label}
                  unit={a.unit}
                  value={mr === undefined ? undefined : sig(mr / a.factor, 6)}
                  onChange={(v) => setAmount(a, v)}
                  placeholder={used !== undefined && M ? `${sig(used / M / a.factor, 3)}` : "default"}
                  error={p.fieldErrors[`${key}.${a.id}`]}
                />
              );
            })}
          </div>
          <div className="flex items-center gap-2 text-[12px]">
            <label htmlFor="ozone" className="text-stone-600">
              Ozone
            </label>
            <select
              id="ozone"
              value={c.ozone ?? CONDITION_DEFAULTS.ozone}
              onChange={(e) => set({ ozone: e.target.value === "solved" ? "solved" : undefined })}
              className="rounded border border-stone-300 bg-white px-1 py-0.5 focus:outline-2 focus:outline-stone-800"
            >
              <option value="held">held at the climatology</option>
              <option value="solved">solved for steady state</option>
            </select>
          </div>
        </fieldset>
      </form>
    </Panel>
  );
}

/** The 1976 standard at this altitude, or null outside its range (the server then names the problem). */
function standardOrNull(z: number) {
  try {
    return standardAtmosphere(z);
  } catch {
    return null;
  }
}

function formatTime(h: number): string {
  const hh = Math.floor(h);
  const mm = Math.round((h - hh) * 60);
  return `${String(hh).padStart(2, "0")}:${String(mm).padStart(2, "0")}`;
}
