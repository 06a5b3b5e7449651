"use client";
/**
 * A labelled number input that keeps what the user types while it is
 * incomplete, reports a number (or undefined when emptied: "use the default")
 * and shows the default in use as its placeholder. Used by the explorer's
 * conditions and the profile forms; the accessible name is "label (unit)".
 */
import { useEffect, useState } from "react";

interface Props {
  id: string;
  label: string;
  unit: string;
  /** value in display units; undefined = default in use */
  value: number | undefined;
  onChange(v: number | undefined): void;
  /** the default in use, display units */
  placeholder?: string;
  min?: number;
  max?: number;
  step?: number | "any";
  error?: string | null;
  hint?: string;
  className?: string;
}

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
  error,
  hint,
  className = "",
}: Props) {
  const [text, setText] = useState(value === undefined ? "" : String(value));
  useEffect(() => {
    setText((t) => (value === undefined ? (t === "" ? t : "") : Number(t) === value && t !== "" ? t : String(value)));
  }, [value]);
  const localBad = text !== "" && !Number.isFinite(Number(text));
  const msg = localBad ? "expected a number" : error;
  return (
    <div className={className}>
      <div className="flex items-baseline justify-between text-[12px] text-stone-600">
        <label htmlFor={id}>
          {label}
          <span className="sr-only"> ({unit})</span>
        </label>
        {value !== undefined ? (
          <button
            type="button"
            className="text-[11px] text-stone-500 underline decoration-stone-300 hover:text-stone-900"
            onClick={() => {
              setText("");
              onChange(undefined);
            }}
            aria-label={`Reset ${label} to the default`}
          >
            reset
          </button>
        ) : null}
      </div>
      <div
        className={`mt-0.5 flex items-center rounded border bg-white focus-within:outline-2 focus-within:outline-stone-800 ${
          msg ? "border-red-600" : "border-stone-300"
        }`}
      >
        <input
          id={id}
          name={id}
          type="text"
          inputMode="decimal"
          value={text}
          placeholder={placeholder}
          aria-invalid={msg ? true : undefined}
          aria-describedby={msg ? `${id}-error` : hint ? `${id}-hint` : undefined}
          data-min={min}
          data-max={max}
          data-step={step}
          onChange={(e) => {
            const t = e.target.value.trim();
            setText(e.target.value);
            if (t === "") onChange(undefined);
            else if (Number.isFinite(Number(t))) onChange(Number(t));
          }}
          className="w-full min-w-0 rounded bg-transparent px-1.5 py-1 text-[13px] tabular-nums outline-none placeholder:text-stone-400"
        />
        <span aria-hidden="true" className="shrink-0 pr-1.5 text-[11px] text-stone-500">
          {unit}
        </span>
      </div>
      {msg ? (
        <p id={`${id}-error`} role="alert" className="mt-0.5 text-[11px] text-red-700">
          {msg}
        </p>
      ) : hint ? (
        <p id={`${id}-hint`} className="mt-0.5 text-[11px] text-stone-500">
          {hint}
        </p>
      ) : null}
    </div>
  );
}
