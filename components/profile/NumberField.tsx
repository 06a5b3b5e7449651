"use client";
/** A small labelled number input; empty means "use the default" (shown as the placeholder). */
import { useState } from "react";

export function NumberField({
  id,
  label,
  unit,
  value,
  onChange,
  placeholder,
  min,
  max,
  step = "any",
}: {
  id: string;
  label: string;
  unit: string;
  value: number | undefined;
  onChange(v: number | undefined): void;
  placeholder?: string;
  min?: number;
  max?: number;
  step?: number | "any";
}) {
  const [text, setText] = useState(value === undefined ? "" : String(value));
  const bad = text.trim() !== "" && !Number.isFinite(Number(text));
  return (
    <label htmlFor={id} className="text-[12px] text-stone-600">
      {label} ({unit})
      <input
        id={id}
        type="number"
        inputMode="decimal"
        className={`mt-0.5 w-full rounded border px-2 py-1 text-[13px] focus:outline-2 focus:outline-offset-1 ${bad ? "border-red-600" : "border-stone-300"}`}
        value={text}
        placeholder={placeholder}
        min={min}
        max={max}
        step={step}
        aria-invalid={bad || undefined}
        onChange={(e) => {
          setText(e.target.value);
          const t = e.target.value.trim();
          onChange(t === "" || !Number.isFinite(Number(t)) ? undefined : Number(t));
        }}
      />
    </label>
  );
}
