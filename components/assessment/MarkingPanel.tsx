"use client";
/**
 * Marking: the instructor chooses (or pastes) the class's answer file, the
 * server marks it against the stored key, and the marks are shown and offered
 * as a CSV download.
 */
import { useId, useState } from "react";
import type { ClassMarks } from "@/lib/assessment/types";
import { ApiError, postText } from "../ui/apiClient";

export function MarkingPanel({ instructorId, questions }: { instructorId: string; questions: number }) {
  const uid = useId();
  const [text, setText] = useState("");
  const [fileName, setFileName] = useState("");
  const [marks, setMarks] = useState<(ClassMarks & { csv: string }) | null>(null);
  const [error, setError] = useState<ApiError | null>(null);
  const [busy, setBusy] = useState(false);

  async function mark() {
    setBusy(true);
    setError(null);
    try {
      setMarks(
        await postText<ClassMarks & { csv: string }>(`/api/assessments/${instructorId}/marks`, text, "text/csv"),
      );
    } catch (e) {
      setMarks(null);
      setError(e instanceof ApiError ? e : new ApiError(0, "client", String(e)));
    } finally {
      setBusy(false);
    }
  }

  function download() {
    if (!marks) return;
    const url = URL.createObjectURL(new Blob([marks.csv], { type: "text/csv" }));
    const a = document.createElement("a");
    a.href = url;
    a.download = `marks-${instructorId}.csv`;
    a.click();
    URL.revokeObjectURL(url);
  }

  const qs = Array.from({ length: questions }, (_, i) => i + 1);
  return (
    <section className="no-print rounded border border-stone-300 bg-white p-4" aria-labelledby={`${uid}-h`}>
      <h2 id={`${uid}-h`} className="text-[15px] font-semibold">
        Mark the class
      </h2>
      <p className="mt-1 text-[12px] text-stone-600">
        A CSV with the columns <code>student,variant,q1,…,q{questions}</code>, one row per student (start from the{" "}
        <a className="underline" href={`/api/assessments/${instructorId}/answers-template.csv`}>
          blank answer file
        </a>
        ). Numbers may be written 3.2e-7 or 3.2×10^-7; named answers as the letter or the name.
      </p>
      <div className="mt-3 flex flex-wrap items-center gap-3">
        <label htmlFor={`${uid}-file`} className="text-[13px] font-medium">
          Answer file
        </label>
        <input
          id={`${uid}-file`}
          type="file"
          accept=".csv,text/csv"
          onChange={async (e) => {
            const f = e.target.files?.[0];
            if (!f) return;
            setFileName(f.name);
            setText(await f.text());
          }}
          className="text-[13px]"
        />
      </div>
      <label htmlFor={`${uid}-text`} className="mt-3 block text-[12px] font-medium text-stone-700">
        …or paste the CSV here{fileName ? ` (loaded from ${fileName})` : ""}
      </label>
      <textarea
        id={`${uid}-text`}
        value={text}
        onChange={(e) => setText(e.target.value)}
        rows={5}
        className="mt-0.5 w-full rounded border border-stone-300 bg-white px-2 py-1 font-mono text-[12px] focus:outline-2 focus:outline-stone-800"
        placeholder={`student,variant,${qs.map((q) => `q${q}`).join(",")}`}
      />
      <div className="mt-2 flex gap-3">
        <button
          type="button"
          onClick={() => void mark()}
          disabled={busy || text.trim() === ""}
          className="rounded bg-stone-900 px-4 py-2 text-[13px] font-medium text-white hover:bg-stone-700 focus:outline-2 focus:outline-offset-2 disabled:opacity-40"
        >
          {busy ? "Marking…" : "Mark"}
        </button>
        {marks && (
          <button
            type="button"
            onClick={download}
            className="rounded border border-stone-800 px-4 py-2 text-[13px] font-medium hover:bg-stone-100 focus:outline-2 focus:outline-offset-2"
          >
            Download marks (CSV)
          </button>
        )}
      </div>
      {error && (
        <div role="alert" className="mt-3 rounded border border-red-300 bg-red-50 p-3 text-[13px] text-red-900">
          <p className="font-semibold">The file was not marked{error.path ? ` (${error.path})` : ""}</p>
          <p>{error.message}</p>
        </div>
      )}
      {marks && (
        <div className="mt-4 overflow-x-auto">
          {marks.warnings.length > 0 && (
            <ul className="mb-2 list-disc pl-5 text-[12px] text-amber-900" aria-label="Warnings">
              {marks.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          )}
          <table className="min-w-full border-collapse text-[12px] tabular-nums" aria-label="Marks">
            <thead>
              <tr className="border-b border-stone-400 text-left">
                <th className="py-1 pr-3">Student</th>
                <th className="py-1 pr-3">Variant</th>
                {qs.map((q) => (
                  <th key={q} className="py-1 pr-3">
                    Q{q}
                  </th>
                ))}
                <th className="py-1 pr-3">Total</th>
              </tr>
            </thead>
            <tbody>
              {marks.students.map((s) => (
                <tr key={s.row} className="border-b border-stone-200">
                  <td className="py-1 pr-3">{s.student}</td>
                  <td className="py-1 pr-3">{s.variant}</td>
                  {s.cells.map((c) => (
                    <td
                      key={c.question}
                      className={`py-1 pr-3 ${c.status === "correct" ? "text-emerald-800" : c.status === "blank" ? "text-stone-500" : "text-red-800"}`}
                      title={`${c.given || "(blank)"}: ${c.status}${c.note ? ` — ${c.note}` : ""}`}
                    >
                      {c.mark} <span className="sr-only">({c.status})</span>
                    </td>
                  ))}
                  <td className="py-1 pr-3 font-semibold">
                    {s.total} / {s.outOf}
                  </td>
                </tr>
              ))}
            </tbody>
            <tfoot>
              <tr className="border-t border-stone-400 text-stone-700">
                <td className="py-1 pr-3" colSpan={2}>
                  Correct / answered
                </td>
                {marks.questions.map((q) => (
                  <td key={q.question} className="py-1 pr-3">
                    {q.correct}/{q.answered}
                  </td>
                ))}
                <td />
              </tr>
            </tfoot>
          </table>
        </div>
      )}
    </section>
  );
}
