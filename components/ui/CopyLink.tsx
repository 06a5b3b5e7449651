"use client";
/**
 * A link to a page of this server, written out in full with its address, and a
 * button that copies it. `display: "field"` (default) is a labelled read-only
 * field on one line, for a page's own permalink; `display: "link"` is a titled
 * block with the link and a note, for links handed to other people.
 */
import { useEffect, useId, useState } from "react";

/** ms the button says "Copied" after a copy */
const COPIED_MS = 1500;

export interface CopyLinkProps {
  /** the page's path, e.g. "/compare/abc" */
  path: string;
  /** default "Permalink" */
  label?: string;
  /** a line under the link (the "link" display only) */
  note?: string;
  /** default "field" */
  display?: "field" | "link";
}

export function CopyLink({ path, label = "Permalink", note, display = "field" }: CopyLinkProps) {
  const id = useId();
  const [url, setUrl] = useState(path);
  const [copied, setCopied] = useState(false);
  useEffect(() => setUrl(`${window.location.origin}${path}`), [path]);
  const copy = () =>
    navigator.clipboard?.writeText(url).then(
      () => {
        setCopied(true);
        setTimeout(() => setCopied(false), COPIED_MS);
      },
      () => {},
    );
  const button = (className: string) => (
    <button type="button" onClick={() => void copy()} className={className}>
      {copied ? "Copied" : "Copy"}
    </button>
  );
  if (display === "link")
    return (
      <div className="space-y-1">
        <p className="text-[12px] font-semibold text-stone-700">{label}</p>
        <div className="flex flex-wrap items-center gap-2">
          <a href={path} className="break-all font-mono text-[13px] text-stone-900 underline">
            {url}
          </a>
          {button(
            "no-print rounded border border-stone-400 px-2 py-0.5 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-offset-1",
          )}
        </div>
        {note ? <p className="text-[11px] text-stone-500">{note}</p> : null}
      </div>
    );
  return (
    <span className="flex items-center gap-2 text-[12px]">
      <label htmlFor={id} className="text-stone-600">
        {label}
      </label>
      <input
        id={id}
        readOnly
        value={url}
        className="w-72 rounded border border-stone-300 px-2 py-0.5 font-mono text-[11px]"
        onFocus={(e) => e.target.select()}
      />
      {button("rounded border border-stone-400 px-2 py-0.5 hover:bg-stone-100 focus:outline-2 focus:outline-offset-2")}
    </span>
  );
}
