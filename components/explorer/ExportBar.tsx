"use client";
/** Downloads of the picture and the tables, and the permalink with a copy button. */
import { useState } from "react";
import { pinAnalysis } from "./api";

interface Props {
  analysisId: string | null;
  onPng(): Promise<void>;
  onSvg(): void;
  busy: boolean;
}

const linkCls =
  "rounded border border-stone-300 bg-white px-2 py-0.5 text-[12px] text-stone-800 hover:border-stone-500 focus:outline-2 focus:outline-offset-1 focus:outline-stone-800";

export function ExportBar({ analysisId, onPng, onSvg, busy }: Props) {
  const [copied, setCopied] = useState<"idle" | "ok" | "failed">("idle");
  const permalink = analysisId ? `${typeof window === "undefined" ? "" : window.location.origin}/a/${analysisId}` : "";
  const copy = async () => {
    // a copied permalink is one the user asked for: the draft is kept for good
    if (analysisId) void pinAnalysis(analysisId).catch(() => {});
    try {
      await navigator.clipboard.writeText(permalink);
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
        {base ? (
          <>
            <a className={linkCls} href={`${base}/rates.csv`} download>
              rates.csv
            </a>
            <a className={linkCls} href={`${base}/species.csv`} download>
              species.csv
            </a>
            <a className={linkCls} href={`${base}/cycles.csv`} download>
              cycles.csv
            </a>
            <a className={linkCls} href={`${base}.json`} download>
              JSON
            </a>
          </>
        ) : (
          <span className="text-stone-400">available once the analysis is stored</span>
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
          placeholder={busy ? "computing…" : "—"}
          title={
            busy
              ? "the stored analysis on screen; a new one is being computed"
              : "copying, opening or exporting this link keeps the analysis for good; otherwise it expires after some days"
          }
          onFocus={(e) => e.currentTarget.select()}
          className="min-w-[120px] flex-1 rounded border border-stone-300 bg-stone-50 px-1.5 py-0.5 font-mono text-[11px] text-stone-700"
        />
        <button type="button" className={linkCls} onClick={() => void copy()} disabled={!permalink}>
          {copied === "ok" ? "Copied ✓" : copied === "failed" ? "Press Ctrl+C" : "Copy"}
        </button>
      </span>
    </div>
  );
}
