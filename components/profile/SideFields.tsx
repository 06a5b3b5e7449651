"use client";
/**
 * The fields of one side: which profile (the default, a demo profile, an
 * uploaded CSV checked as soon as it is chosen, or a stored sweep), which
 * mechanism, the mode, O3 held or solved, and an optional Cly total.
 */
import { useId, useState } from "react";
import { CONDITION_DEFAULTS } from "@/lib/atmosphere/condition";
import { InputError } from "@/lib/errors";
import { parseProfileCsv } from "@/lib/profiles/parseProfileCsv";
import { isolateText } from "@/lib/viz/isolateText";
import { NumberField } from "../NumberField";
import type { SideState } from "./sideRequest";
import type { MechanismOption, ProfileOption } from "./types";

const select =
  "mt-0.5 w-full rounded border border-stone-300 bg-white px-2 py-1 text-[13px] focus:outline-2 focus:outline-offset-1";

export function SideFields({
  label,
  value,
  onChange,
  mechanisms,
  profiles,
  allowStored = true,
}: {
  label: string;
  value: SideState;
  onChange(v: SideState): void;
  mechanisms: MechanismOption[];
  profiles: ProfileOption[];
  allowStored?: boolean;
}) {
  const id = useId();
  const [csvStatus, setCsvStatus] = useState<{ ok: boolean; text: string } | null>(null);
  const set = (patch: Partial<SideState>) => onChange({ ...value, ...patch });
  const checkCsv = (text: string, name: string) => {
    if (!text.trim()) return setCsvStatus(null);
    try {
      const p = parseProfileCsv(text, { fileName: name || "profile.csv" });
      const z = p.levels.map((l) => l.altitude_km);
      setCsvStatus({ ok: true, text: `${p.levels.length} levels, ${z[0]}–${z[z.length - 1]} km: “${p.title}”` });
    } catch (e) {
      setCsvStatus({ ok: false, text: e instanceof InputError ? e.message : String(e) });
    }
  };
  const demo = value.source.startsWith("demo:");
  return (
    <fieldset className="rounded-md border border-stone-300 bg-white p-3" aria-label={label}>
      <legend className="px-1 text-[13px] font-semibold text-stone-800">{label}</legend>
      <div className="grid grid-cols-2 gap-2">
        <label className="col-span-2 text-[12px] text-stone-600" htmlFor={`${id}-profile`}>
          Profile
          <select
            id={`${id}-profile`}
            className={select}
            value={value.source}
            onChange={(e) => set({ source: e.target.value })}
          >
            {profiles.map((p) => (
              <option key={p.id} value={p.id === "standard" ? "standard" : `demo:${p.id}`}>
                {p.title}
              </option>
            ))}
            <option value="csv">Upload a CSV profile…</option>
            {allowStored ? <option value="stored">A stored sweep (by id)…</option> : null}
          </select>
        </label>
        {demo ? (
          <p className="col-span-2 rounded bg-amber-50 px-2 py-1 text-[12px] text-amber-900" data-testid="demo-label">
            <strong>Invented demo data, not a measurement:</strong>{" "}
            {profiles.find((p) => `demo:${p.id}` === value.source)?.note.replace(/^invented demo data:\s*/i, "")}
          </p>
        ) : null}
        {value.source === "csv" ? (
          <div className="col-span-2 space-y-1">
            <label className="block text-[12px] text-stone-600" htmlFor={`${id}-file`}>
              CSV file (see the format below)
              <input
                id={`${id}-file`}
                type="file"
                accept=".csv,text/csv,text/plain"
                className="mt-0.5 block w-full text-[12px]"
                onChange={async (e) => {
                  const f = e.target.files?.[0];
                  if (!f) return;
                  const text = await f.text();
                  set({ csv: text, csvName: f.name });
                  checkCsv(text, f.name);
                }}
              />
            </label>
            <label className="block text-[12px] text-stone-600" htmlFor={`${id}-csv`}>
              or paste it
              <textarea
                id={`${id}-csv`}
                rows={5}
                className="mt-0.5 w-full rounded border border-stone-300 p-1 font-mono text-[11px]"
                value={value.csv}
                placeholder={"altitude (km),T (K),p (hPa),H2O (ppmv),Cly (ppbv)\n20,216.7,55.3,4.5,2.0"}
                onChange={(e) => {
                  set({ csv: e.target.value });
                  checkCsv(e.target.value, value.csvName);
                }}
              />
            </label>
            {csvStatus ? (
              <p
                data-testid="csv-status"
                role={csvStatus.ok ? "status" : "alert"}
                className={`text-[12px] ${csvStatus.ok ? "text-emerald-800" : "text-red-800"}`}
              >
                {csvStatus.text}
              </p>
            ) : null}
          </div>
        ) : null}
        {value.source === "stored" ? (
          <label className="col-span-2 text-[12px] text-stone-600" htmlFor={`${id}-sweep`}>
            Sweep id (from a sweep's permalink)
            <input
              id={`${id}-sweep`}
              className={select}
              value={value.sweepId}
              onChange={(e) => set({ sweepId: e.target.value })}
              placeholder="e.g. 3f9K0xQm1bYpLw2Z"
            />
          </label>
        ) : (
          <>
            <label className="col-span-2 text-[12px] text-stone-600" htmlFor={`${id}-mech`}>
              Mechanism
              <select
                id={`${id}-mech`}
                className={select}
                value={value.mechanismId}
                onChange={(e) => set({ mechanismId: e.target.value })}
              >
                {mechanisms.map((m) => (
                  <option key={m.id} value={m.id}>
                    {isolateText(m.title)}
                  </option>
                ))}
              </select>
            </label>
            <label className="text-[12px] text-stone-600" htmlFor={`${id}-mode`}>
              Mode
              <select
                id={`${id}-mode`}
                className={select}
                value={value.mode}
                onChange={(e) => set({ mode: e.target.value as SideState["mode"] })}
              >
                <option value="instantaneous">instantaneous (at the local time)</option>
                <option value="diurnal">24-hour mean</option>
              </select>
            </label>
            <label className="text-[12px] text-stone-600" htmlFor={`${id}-ozone`}>
              O3
              <select
                id={`${id}-ozone`}
                className={select}
                value={value.ozone}
                onChange={(e) => set({ ozone: e.target.value as SideState["ozone"] })}
              >
                <option value="held">held (profile or climatology)</option>
                <option value="solved">solved (column from the levels above)</option>
              </select>
            </label>
            <NumberField
              id={`${id}-cly`}
              label="Cly total"
              unit="ppbv"
              value={value.cly_ppbv}
              onChange={(v) => set({ cly_ppbv: v })}
              placeholder="climatology"
              min={0}
            />
            <NumberField
              id={`${id}-lat`}
              label="Latitude"
              unit="°N"
              value={value.latitude_deg}
              onChange={(v) => set({ latitude_deg: v })}
              placeholder="45"
              min={-90}
              max={90}
            />
            <label className="text-[12px] text-stone-600" htmlFor={`${id}-cloud`}>
              Polar cloud
              <select
                id={`${id}-cloud`}
                className={select}
                value={value.cloud ?? CONDITION_DEFAULTS.cloud}
                onChange={(e) => set({ cloud: e.target.value as NonNullable<SideState["cloud"]> })}
              >
                <option value="none">none</option>
                <option value="auto">automatic, per level (T_NAT, frost point)</option>
                <option value="NAT">NAT at every level</option>
                <option value="ice">ice at every level</option>
              </select>
            </label>
          </>
        )}
      </div>
    </fieldset>
  );
}
