"use client";
/** The page's permalink with a copy button. */
import { useEffect, useState } from "react";

export function CopyLink({ path }: { path: string }) {
  const [url, setUrl] = useState(path);
  const [copied, setCopied] = useState(false);
  useEffect(() => setUrl(`${window.location.origin}${path}`), [path]);
  return (
    <span className="flex items-center gap-2 text-[12px]">
      <label htmlFor="permalink" className="text-stone-600">
        Permalink
      </label>
      <input
        id="permalink"
        readOnly
        value={url}
        className="w-72 rounded border border-stone-300 px-2 py-0.5 font-mono text-[11px]"
        onFocus={(e) => e.target.select()}
      />
      <button
        type="button"
        className="rounded border border-stone-400 px-2 py-0.5 hover:bg-stone-100 focus:outline-2 focus:outline-offset-2"
        onClick={async () => {
          await navigator.clipboard?.writeText(url).catch(() => {});
          setCopied(true);
          setTimeout(() => setCopied(false), 1500);
        }}
      >
        {copied ? "Copied" : "Copy"}
      </button>
    </span>
  );
}
