"use client";
/** The altitude grid of a sweep: from, to, step (km); empty fields use the defaults. */
import type { SweepGrid } from "@/lib/profiles/types";
import { NumberField } from "../NumberField";

export function GridFields({ value, onChange }: { value: SweepGrid; onChange(v: SweepGrid): void }) {
  return (
    <fieldset className="grid grid-cols-3 gap-2 rounded-md border border-stone-300 bg-white p-3">
      <legend className="px-1 text-[13px] font-semibold text-stone-800">Altitude levels</legend>
      <NumberField
        id="grid-from"
        label="From"
        unit="km"
        value={value.from_km}
        onChange={(v) => onChange({ ...value, from_km: v })}
        placeholder="10"
        min={0}
        max={86}
      />
      <NumberField
        id="grid-to"
        label="To"
        unit="km"
        value={value.to_km}
        onChange={(v) => onChange({ ...value, to_km: v })}
        placeholder="60"
        min={0}
        max={86}
      />
      <NumberField
        id="grid-step"
        label="Step"
        unit="km"
        value={value.step_km}
        onChange={(v) => onChange({ ...value, step_km: v })}
        placeholder="1"
        min={0.05}
      />
    </fieldset>
  );
}
