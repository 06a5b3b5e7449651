"use client";
/** Choose a built-in or uploaded mechanism, or upload a new one. */
import { useEffect, useRef, useState } from "react";
import { isolateText } from "@/lib/viz/isolateText";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";
import type { Problem } from "../ui/apiClient";
import { UploadBox } from "./UploadBox";

interface Props {
  mechanisms: MechanismSummary[];
  mechanismId: string;
  mechanism: MechanismView | null;
  onMechanism(id: string): void;
  onUploaded(m: { id: string; title: string; warnings: Problem[] }): void;
}

export function MechanismPicker({ mechanisms, mechanismId, mechanism, onMechanism, onUploaded }: Props) {
  const [uploading, setUploading] = useState(false);
  const dialog = useRef<HTMLDialogElement>(null);
  useEffect(() => {
    const d = dialog.current;
    if (!d) return;
    if (uploading && !d.open) d.showModal();
    if (!uploading && d.open) d.close();
  }, [uploading]);
  const builtins = mechanisms.filter((m) => m.builtin);
  const uploads = mechanisms.filter((m) => !m.builtin);
  const known = mechanisms.some((m) => m.id === mechanismId);
  const current = mechanisms.find((m) => m.id === mechanismId);
  return (
    <div>
      <label htmlFor="mechanism" className="text-[11px] font-semibold uppercase tracking-wider text-stone-500">
        Mechanism
      </label>
      <div className="mt-0.5 flex gap-1">
        <select
          id="mechanism"
          value={mechanismId}
          onChange={(e) => onMechanism(e.target.value)}
          className="min-w-0 flex-1 rounded border border-stone-300 bg-white px-1 py-1 text-[13px] focus:outline-2 focus:outline-stone-800"
        >
          {!known ? <option value={mechanismId}>{isolateText(mechanism?.title ?? mechanismId)}</option> : null}
          <optgroup label="Built-in">
            {builtins.map((m) => (
              <option key={m.id} value={m.id}>
                {m.title}
              </option>
            ))}
          </optgroup>
          {uploads.length ? (
            <optgroup label="Uploaded">
              {uploads.map((m) => (
                <option key={m.id} value={m.id}>
                  {isolateText(m.title)}
                </option>
              ))}
            </optgroup>
          ) : null}
        </select>
        <button
          type="button"
          aria-haspopup="dialog"
          onClick={() => setUploading((u) => !u)}
          className="shrink-0 rounded border border-stone-300 bg-white px-2 text-[12px] hover:border-stone-500 focus:outline-2 focus:outline-stone-800"
        >
          Upload…
        </button>
      </div>
      <p className="mt-0.5 text-[11px] text-stone-500">
        {current ? `${current.speciesCount} species, ${current.reactionCount} reactions. ` : ""}
        {current?.description ?? mechanism?.description ?? ""}
      </p>
      <dialog
        ref={dialog}
        aria-labelledby="upload-title"
        onClose={() => setUploading(false)}
        className="m-auto w-[760px] max-w-[95vw] rounded-md border border-stone-300 bg-white p-0 shadow-xl backdrop:bg-stone-900/30"
      >
        <div className="flex items-center justify-between border-b border-stone-200 px-4 py-2">
          <h2 id="upload-title" className="text-[14px] font-semibold text-stone-900">
            Upload a mechanism
          </h2>
          <button
            type="button"
            onClick={() => setUploading(false)}
            aria-label="Close"
            className="rounded px-1.5 text-stone-500 hover:bg-stone-100 hover:text-stone-900"
          >
            ✕
          </button>
        </div>
        <div className="px-4 py-3">
          {uploading ? (
            <UploadBox
              onClose={() => setUploading(false)}
              onUploaded={(m) => {
                setUploading(false);
                onUploaded(m);
              }}
            />
          ) : null}
        </div>
      </dialog>
    </div>
  );
}
