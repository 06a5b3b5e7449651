"use client";
/**
 * Downloads of the picture and the tables, and the permalink with a copy
 * button. The explorer's recomputes are not stored: copying the permalink or
 * asking for a table stores the analysis on screen first (onStore), for good.
 */
import { useState } from "react";
import { pinAnalysis } from "./api";

interface Props {
  /** the stored analysis on screen, or null while it is only a preview */
  analysisId: string | null;
  /** stores the analysis on screen and resolves to its id */
  onStore(): Promise<string>;
  onPng(): Promise<void>;
  onSvg(): void;
  busy: boolean;
}

const linkCls =
  "rounded border border-stone-300 bg-white px-2 py-0.5 text-[12px] text-stone-800 hover:border-stone-500 focus:outline-2 focus:outline-offset-1 focus:outline-stone-800";

const TABLES = [
  ["rates.csv", "/rates.csv"],
  ["species.csv", "/species.csv"],
  ["cycles.csv", "/cycles.csv"],
  ["JSON", ".json"],
] as const;

const permalinkOf = (id: string) => `${typeof window === "undefined" ? "" : window.location.origin}/a/${id}`;

export function ExportBar({ analysisId, onStore, onPng, onSvg, busy }: Props) {
  const [copied, setCopied] = useState<"idle" | "ok" | "failed">("idle");
  const [storeError, setStoreError] = useState<string | null>(null);
  const permalink = analysisId ? permalinkOf(analysisId) : "";
  const stored = async () => {
    setStoreError(null);
    try {
      return await onStore();
    } catch (e) {
      setStoreError(`The analysis could not be stored: ${(e as Error).message}`);
      return null;
    }
  };
  const downloadTable = async (suffix: string) => {
    const id = await stored();
    if (!id) return;
    const a = document.createElement("a");
    a.href = `/api/analyses/${id}${suffix}`;
    a.download = "";
    a.click();
  };
  const copy = async () => {
    // a copied permalink is one the user asked for: an older draft is kept for good
    if (analysisId) void pinAnalysis(analysisId).catch(() => {});
    const id = analysisId ?? (await stored());
    if (!id) return;
    try {
      await navigator.clipboard.writeText(permalinkOf(id));
      setCopied("ok");
    } catch {
      const el = document.getElementById("permalink") as HTMLInputElement | null;
      el?.select();
      setCopied("failed");
    }
    setTimeout(() => setCopied("idle"), 2500);
  };
  const base = analysisId ? `/api/analyses/${analysisId}` : null;
  return (
    <div data-testid="export" className="flex flex-wrap items-center gap-x-3 gap-y-1.5 text-[12px]">
      <span className="flex items-center gap-1">
        <span className="text-stone-500">Graph</span>
        <button type="button" className={linkCls} onClick={() => void onPng()}>
          PNG
        </button>
        <button type="button" className={linkCls} onClick={onSvg}>
          SVG
        </button>
      </span>
      <span className="flex items-center gap-1">
        <span className="text-stone-500">Tables</span>
        {TABLES.map(([name, suffix]) =>
          base ? (
            <a key={name} className={linkCls} href={`${base}${suffix}`} download>
              {name}
            </a>
          ) : (
            <button
              key={name}
              type="button"
              className={linkCls}
              disabled={busy}
              title="stores this analysis for good, then downloads the table"
              onClick={() => void downloadTable(suffix)}
            >
              {name}
            </button>
          ),
        )}
      </span>
      <span className="flex min-w-0 flex-[1_1_300px] items-center gap-1">
        <label htmlFor="permalink" className="text-stone-500">
          Permalink
        </label>
        <input
          id="permalink"
          data-testid="permalink"
          readOnly
          value={permalink}
          placeholder={busy ? "computing…" : "Copy stores this analysis and gives its link"}
          title="a permalink is kept for good and always shows the same numbers"
          onFocus={(e) => e.currentTarget.select()}
          className="min-w-[120px] flex-1 rounded border border-stone-300 bg-stone-50 px-1.5 py-0.5 font-mono text-[11px] text-stone-700"
        />
        <button type="button" className={linkCls} onClick={() => void copy()} disabled={busy && !permalink}>
          {copied === "ok" ? "Copied ✓" : copied === "failed" ? "Press Ctrl+C" : "Copy"}
        </button>
      </span>
      {storeError ? (
        <span role="alert" className="basis-full text-red-800">
          {storeError}
        </span>
      ) : null}
    </div>
  );
}
