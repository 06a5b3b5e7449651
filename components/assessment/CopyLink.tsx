"use client";
/** A link written out in full (with this server's address) and a button that copies it. */
import { useEffect, useState } from "react";

export function CopyLink({ label, path, note }: { label: string; path: string; note: string }) {
  const [origin, setOrigin] = useState("");
  const [copied, setCopied] = useState(false);
  useEffect(() => setOrigin(window.location.origin), []);
  const url = `${origin}${path}`;
  return (
    <div className="space-y-1">
      <p className="text-[12px] font-semibold text-stone-700">{label}</p>
      <div className="flex flex-wrap items-center gap-2">
        <a href={path} className="break-all font-mono text-[13px] text-stone-900 underline">
          {url}
        </a>
        <button
          type="button"
          onClick={() => {
            void navigator.clipboard?.writeText(url).then(() => setCopied(true));
          }}
          className="no-print rounded border border-stone-400 px-2 py-0.5 text-[12px] hover:bg-stone-100 focus:outline-2 focus:outline-offset-1"
        >
          {copied ? "Copied" : "Copy"}
        </button>
      </div>
      <p className="text-[11px] text-stone-500">{note}</p>
    </div>
  );
}
