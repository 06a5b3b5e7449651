"use client";
/**
 * Paste or choose a mechanism document, send it to the server, and show each
 * problem the server finds beside the line it names.
 */
import { useRef, useState } from "react";
import { ApiError, type Problem } from "../ui/apiClient";
import { uploadMechanism } from "./api";

interface Props {
  onUploaded(m: { id: string; title: string; warnings: Problem[]; deletionToken?: string }): void;
  onClose(): void;
}

export function UploadBox({ onUploaded, onClose }: Props) {
  const [text, setText] = useState("");
  const [checked, setChecked] = useState<{ text: string; error: ApiError } | null>(null);
  const [busy, setBusy] = useState(false);
  const listing = useRef<HTMLOListElement>(null);

  const submit = async () => {
    setBusy(true);
    try {
      const out = await uploadMechanism(text);
      setChecked(null);
      onUploaded(out);
    } catch (e) {
      const err = e instanceof ApiError ? e : new ApiError(0, "client", String(e));
      setChecked({ text, error: err });
      requestAnimationFrame(() =>
        listing.current?.querySelector("[data-problem]")?.scrollIntoView({ block: "center" }),
      );
    } finally {
      setBusy(false);
    }
  };

  const problems: Problem[] = checked
    ? checked.error.problems.length
      ? checked.error.problems
      : [
          {
            severity: "error",
            code: checked.error.code,
            message: checked.error.message,
            path: checked.error.path,
            line: checked.error.line,
            column: checked.error.column,
          },
        ]
    : [];
  const lines = checked ? checked.text.split("\n") : [];
  const byLine = new Map<number, Problem[]>();
  const unplaced: Problem[] = [];
  for (const p of problems) {
    if (p.line && p.line <= lines.length) byLine.set(p.line, [...(byLine.get(p.line) ?? []), p]);
    else unplaced.push(p);
  }

  return (
    <div data-testid="upload">
      <label htmlFor="mechanism-text" className="text-[12px] font-medium text-stone-700">
        Mechanism document (YAML or JSON)
      </label>
      <textarea
        id="mechanism-text"
        value={text}
        onChange={(e) => setText(e.target.value)}
        spellCheck={false}
        rows={12}
        placeholder="Paste a mechanism document here, or choose a file below."
        className="mt-1 w-full resize-y rounded border border-stone-300 bg-white p-1.5 font-mono text-[11px] leading-4 focus:outline-2 focus:outline-stone-800"
      />
      <div className="mt-1 flex flex-wrap items-center gap-2">
        <label className="cursor-pointer rounded border border-stone-300 bg-white px-2 py-0.5 text-[12px] hover:border-stone-500 focus-within:outline-2 focus-within:outline-stone-800">
          Choose file…
          <input
            type="file"
            accept=".yaml,.yml,.json,text/yaml,application/json,text/plain"
            className="sr-only"
            onChange={async (e) => {
              const f = e.target.files?.[0];
              if (f) setText(await f.text());
            }}
          />
        </label>
        <button
          type="button"
          onClick={() => void submit()}
          disabled={busy || !text.trim()}
          className="rounded bg-stone-800 px-2.5 py-0.5 text-[12px] font-medium text-white hover:bg-stone-700 disabled:bg-stone-400 focus:outline-2 focus:outline-offset-1 focus:outline-stone-800"
        >
          {busy ? "Checking…" : "Check and use"}
        </button>
        <button type="button" onClick={onClose} className="text-[12px] text-stone-600 underline hover:text-stone-900">
          Cancel
        </button>
      </div>
      {checked ? (
        <div data-testid="upload-problems" role="alert" className="mt-2">
          <p className="text-[12px] font-semibold text-red-800">
            The server did not accept this document: {problems.length} problem{problems.length === 1 ? "" : "s"}.
            {checked.text !== text ? (
              <span className="font-normal text-stone-500"> (edited since; check again)</span>
            ) : null}
          </p>
          {unplaced.map((p) => (
            <p key={`${p.code}-${p.message}`} className="text-[11px] text-red-800">
              {p.path ? <code>{p.path}: </code> : null}
              {p.message}
            </p>
          ))}
          <ol
            ref={listing}
            className="relative mt-1 max-h-64 overflow-auto rounded border border-stone-300 bg-white font-mono text-[11px] leading-4"
          >
            {lines.map((ln, i) => {
              const n = i + 1;
              const here = byLine.get(n);
              return (
                <li key={n} data-line={n} data-problem={here ? "true" : undefined} className={here ? "bg-red-50" : ""}>
                  <div className="flex">
                    <span className="w-8 shrink-0 select-none pr-1.5 text-right text-stone-500">{n}</span>
                    <span className="whitespace-pre">{ln || " "}</span>
                  </div>
                  {here?.map((p) => (
                    <div
                      key={`${p.code}-${p.column}-${p.message}`}
                      className={`ml-8 whitespace-pre-wrap border-l-2 pl-1.5 font-sans ${
                        p.severity === "warning" ? "border-amber-500 text-amber-800" : "border-red-600 text-red-800"
                      }`}
                    >
                      {p.column ? `column ${p.column}: ` : ""}
                      {p.message}
                      {p.path ? <span className="text-stone-500"> ({p.path})</span> : null}
                    </div>
                  ))}
                </li>
              );
            })}
          </ol>
        </div>
      ) : null}
    </div>
  );
}
