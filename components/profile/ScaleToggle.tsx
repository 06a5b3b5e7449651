"use client";
/** A labelled pair of radio buttons choosing a chart scale (keyboard: arrows within the group). */

export function ScaleToggle<T extends string>({
  name,
  label,
  value,
  options,
  onChange,
}: {
  name: string;
  label: string;
  value: T;
  options: readonly { value: T; label: string }[];
  onChange(v: T): void;
}) {
  return (
    <fieldset className="flex items-center gap-2 text-[12px] text-stone-700">
      <legend className="sr-only">{label}</legend>
      <span aria-hidden="true">{label}:</span>
      {options.map((o) => (
        <label key={o.value} className="flex cursor-pointer items-center gap-1">
          <input
            type="radio"
            name={name}
            value={o.value}
            checked={value === o.value}
            onChange={() => onChange(o.value)}
            className="accent-stone-700"
          />
          {o.label}
        </label>
      ))}
    </fieldset>
  );
}
