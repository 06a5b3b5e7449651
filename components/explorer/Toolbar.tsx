/** Above the network: colour mode, detail, held species, fit, and the status of the analysis. */
import { DETAIL_LEVELS, type ReactionDetail } from "@/lib/viz/reactionDetail";
import type { ColorMode, MechanismView } from "@/lib/viz/types";

interface Props {
  colorMode: ColorMode;
  onColorMode(m: ColorMode): void;
  showHeld: boolean;
  onShowHeld(v: boolean): void;
  /** largest number of reactions drawn */
  detailLimit: number;
  onDetailLimit(limit: number): void;
  detail: ReactionDetail | null;
  onFit(): void;
  onZoom(factor: number): void;
  loading: boolean;
  status: string | null;
  mechanism: MechanismView | null;
  selected: string | null;
  onInspect(id: string | null): void;
}

const seg = (on: boolean) =>
  `px-2 py-0.5 text-[12px] focus-within:outline-2 focus-within:outline-stone-800 cursor-pointer ${on ? "bg-stone-800 text-white" : "bg-white text-stone-700 hover:bg-stone-100"}`;

export function Toolbar({
  colorMode,
  onColorMode,
  showHeld,
  onShowHeld,
  detailLimit,
  onDetailLimit,
  detail,
  onFit,
  onZoom,
  loading,
  status,
  mechanism,
  selected,
  onInspect,
}: Props) {
  return (
    <div className="flex flex-wrap items-center gap-x-4 gap-y-1">
      <fieldset className="flex items-center gap-1.5">
        <legend className="sr-only">Colour the network by</legend>
        <span className="text-[12px] text-stone-500" aria-hidden>
          Colour by
        </span>
        <span className="flex overflow-hidden rounded border border-stone-400">
          <label className={seg(colorMode === "flux")}>
            <input
              type="radio"
              name="color-mode"
              value="flux"
              className="sr-only"
              checked={colorMode === "flux"}
              onChange={() => onColorMode("flux")}
            />
            reaction rate
          </label>
          <label className={`${seg(colorMode === "ox")} border-l border-stone-400`}>
            <input
              type="radio"
              name="color-mode"
              value="ox"
              className="sr-only"
              checked={colorMode === "ox"}
              onChange={() => onColorMode("ox")}
            />
            ozone destroyed
          </label>
        </span>
      </fieldset>
      <span className="flex items-center gap-1 text-[12px] text-stone-700">
        <label htmlFor="network-detail">Detail</label>
        <select
          id="network-detail"
          data-testid="detail"
          value={Number.isFinite(detailLimit) ? String(detailLimit) : "all"}
          onChange={(e) => onDetailLimit(e.target.value === "all" ? Infinity : Number(e.target.value))}
          className="rounded border border-stone-300 bg-white px-1 py-0.5 text-[12px] focus:outline-2 focus:outline-stone-800"
        >
          {DETAIL_LEVELS.map((n) => (
            <option key={String(n)} value={Number.isFinite(n) ? String(n) : "all"}>
              {Number.isFinite(n) ? `top ${n} reactions` : "every reaction with flux"}
            </option>
          ))}
        </select>
        {detail && detail.covered !== null ? (
          <span data-testid="hidden-count" className="tabular-nums text-stone-500">
            {detail.shown.length} drawn · {detail.hidden} hidden
            {detail.zeroFlux ? ` (${detail.zeroFlux} with zero flux)` : ""}
          </span>
        ) : null}
      </span>
      <label className="flex items-center gap-1 text-[12px] text-stone-700">
        <input type="checkbox" checked={showHeld} onChange={(e) => onShowHeld(e.target.checked)} />
        show held species
      </label>
      <button
        type="button"
        onClick={onFit}
        className="rounded border border-stone-300 bg-white px-2 py-0.5 text-[12px] hover:border-stone-500 focus:outline-2 focus:outline-stone-800"
      >
        Fit to view
      </button>
      <span className="flex overflow-hidden rounded border border-stone-300">
        <button
          type="button"
          onClick={() => onZoom(1.25)}
          aria-label="Zoom in"
          className="bg-white px-2 py-0.5 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-stone-800"
        >
          +
        </button>
        <button
          type="button"
          onClick={() => onZoom(0.8)}
          aria-label="Zoom out"
          className="border-l border-stone-300 bg-white px-2 py-0.5 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-stone-800"
        >
          −
        </button>
      </span>
      <div className="flex w-full min-w-0 items-center gap-3">
        <label className="flex items-center gap-1 text-[12px] text-stone-700">
          <span aria-hidden>Inspect</span>
          <select
            aria-label="Inspect a species or reaction"
            value={selected ?? ""}
            onChange={(e) => onInspect(e.target.value || null)}
            className="max-w-[180px] rounded border border-stone-300 bg-white px-1 py-0.5 text-[12px] focus:outline-2 focus:outline-stone-800"
          >
            <option value="">— pick —</option>
            <optgroup label="Species">
              {mechanism?.species
                .filter((s) => s.role !== "third-body")
                .map((s) => (
                  <option key={s.id} value={`s:${s.id}`}>
                    {s.label || s.id}
                  </option>
                ))}
            </optgroup>
            <optgroup label="Reactions">
              {mechanism?.reactions.map((r) => (
                <option key={r.id} value={`r:${r.id}`}>
                  {r.id}: {r.equation}
                </option>
              ))}
            </optgroup>
          </select>
        </label>
        <p data-testid="status" aria-live="polite" className="ml-auto min-w-0 truncate text-[11px] text-stone-500">
          {loading ? "Computing… " : ""}
          {status ?? (loading ? "" : "No analysis yet")}
        </p>
      </div>
    </div>
  );
}
