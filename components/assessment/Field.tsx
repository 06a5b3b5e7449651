"use client";
/** A labelled input with its unit, keyboard-reachable, that reports its text as typed. */
import type { ReactNode } from "react";

interface Props {
  id: string;
  label: string;
  /** unit shown after the input; "" for none */
  unit?: string;
  value: string;
  onChange(v: string): void;
  type?: "text" | "number" | "date";
  step?: string;
  min?: number;
  max?: number;
  hint?: ReactNode;
  disabled?: boolean;
  className?: string;
  width?: string;
}

export function Field({
  id,
  label,
  unit = "",
  value,
  onChange,
  type = "number",
  step,
  min,
  max,
  hint,
  disabled,
  className = "",
  width = "w-24",
}: Props) {
  return (
    <div className={className}>
      <label htmlFor={id} className="block text-[12px] font-medium text-stone-700">
        {label}
      </label>
      <div className="mt-0.5 flex items-baseline gap-1">
        <input
          id={id}
          type={type}
          inputMode={type === "number" ? "decimal" : undefined}
          step={step ?? (type === "number" ? "any" : undefined)}
          min={min}
          max={max}
          value={value}
          disabled={disabled}
          onChange={(e) => onChange(e.target.value)}
          className={`${width} rounded border border-stone-300 bg-white px-2 py-1 text-[13px] tabular-nums focus:outline-2 focus:outline-offset-1 focus:outline-stone-800 disabled:bg-stone-100 disabled:text-stone-400`}
          aria-describedby={hint ? `${id}-hint` : undefined}
        />
        {unit && <span className="text-[12px] text-stone-500">{unit}</span>}
      </div>
      {hint && (
        <p id={`${id}-hint`} className="mt-0.5 text-[11px] text-stone-500">
          {hint}
        </p>
      )}
    </div>
  );
}
