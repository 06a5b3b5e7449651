import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { CopyLink, MarkingPanel, PrintButton } from "@/components/assessment";
import { DeletionTokenNote } from "@/components/DeletionTokenNote";
import { formatTolerance } from "@/lib/assessment";
import type { InstructorAssessment } from "@/lib/assessment/types";
import { CAUTION_LINE } from "@/lib/caution";
import { getInstructorAssessment, studentPath } from "@/lib/service/assessments";
import { recordForPage } from "@/lib/service/pageRecord";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Assessment key · Ozone Loss Cycles", robots: { index: false } };

/** The instructor link: the assessment with its key, the downloads and the marking. */
export default async function InstructorPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const found: InstructorAssessment | null = await recordForPage(getInstructorAssessment(id));
  if (!found) notFound();
  const a = found;
  const answer = (v: number, q: number) => a.key.find((k) => k.variant === v && k.question === q);
  const analysisOf = (v: number) => a.analyses.filter((x) => x.variant === v);
  const condition = (v: (typeof a.variants)[number]) =>
    a.sheets
      .find((s) => s.variant === v.number)
      ?.conditions.filter((c) => !["Temperature", "Pressure", "Date"].includes(c.label))
      .map((c) => `${c.label.charAt(0).toLowerCase()}${c.label.slice(1)} ${c.value}`)
      .join(", ");
  return (
    <div className="mx-auto max-w-6xl space-y-6 px-4 py-8 print:p-0">
      <header className="space-y-1">
        <p className="text-[12px] font-semibold uppercase tracking-wider text-red-800">
          Instructor copy — contains the answer key
        </p>
        <h1 className="text-2xl font-semibold tracking-tight">
          <bdi>{a.title}</bdi>
        </h1>
        <p className="text-[13px] text-stone-700">
          <bdi>{a.mechanism.title}</bdi> · {a.variants.length} variants × {a.questions.length} questions · seed{" "}
          <span className="font-mono">{a.spec.seed}</span> · engine {a.engineVersion} · built{" "}
          {a.createdAt.slice(0, 16).replace("T", " ")} UTC
        </p>
      </header>

      <DeletionTokenNote
        what="this assessment, both links (on the student link's API URL, /api/assessments/student/{id}, it revokes the student link alone)"
        deleteUrl={`/api/assessments/${a.instructorId}`}
      />
      <section
        className="no-print grid gap-4 rounded border border-stone-300 bg-white p-4 md:grid-cols-2"
        aria-label="Links"
      >
        <CopyLink
          label="Student link (sheets only, no answers)"
          path={studentPath(a.studentId)}
          note="Give this to students, or open it to print the sheets. It cannot reach the key."
        />
        <CopyLink
          label="Instructor link (this page, with the key)"
          path={`/assess/i/${a.instructorId}`}
          note="Keep it private: anyone with this link sees the answers. It is the only way back to the key."
        />
      </section>

      <section className="no-print flex flex-wrap items-center gap-3" aria-label="Downloads">
        <a
          className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100"
          href={`/api/assessments/${a.instructorId}/key.csv`}
        >
          Key (CSV)
        </a>
        <a
          className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100"
          href={`/api/assessments/${a.instructorId}/key.json`}
        >
          Key (JSON)
        </a>
        <a
          className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100"
          href={`/api/assessments/${a.instructorId}/answers-template.csv`}
        >
          Blank answer file (CSV)
        </a>
        <a
          className="rounded border border-stone-800 px-3 py-1.5 text-[13px] font-medium hover:bg-stone-100"
          href={studentPath(a.studentId)}
        >
          Student sheets
        </a>
        <PrintButton label="Print the key" />
      </section>

      <section aria-labelledby="questions-h">
        <h2 id="questions-h" className="text-[15px] font-semibold">
          Questions
        </h2>
        <table className="mt-2 w-full border-collapse text-[13px]">
          <thead>
            <tr className="border-b border-stone-400 text-left">
              <th className="py-1 pr-3">Q</th>
              <th className="py-1 pr-3">Question</th>
              <th className="py-1 pr-3">On</th>
              <th className="py-1 pr-3">Unit</th>
              <th className="py-1 pr-3">Tolerance</th>
              <th className="py-1 pr-3">Marks</th>
            </tr>
          </thead>
          <tbody>
            {a.questions.map((q) => (
              <tr key={q.number} className="border-b border-stone-200 align-top">
                <td className="py-1 pr-3 font-semibold">{q.number}</td>
                <td className="py-1 pr-3">{q.title}</td>
                <td className="max-w-xs break-words py-1 pr-3 font-mono text-[11px]">{q.detail || "—"}</td>
                <td className="py-1 pr-3">{q.unit || "named answer"}</td>
                <td className="py-1 pr-3">{formatTolerance(q.tolerance, q.unit)}</td>
                <td className="py-1 pr-3 tabular-nums">{q.points}</td>
              </tr>
            ))}
          </tbody>
        </table>
      </section>

      <section aria-labelledby="key-h">
        <h2 id="key-h" className="text-[15px] font-semibold">
          Answer key
        </h2>
        <div className="mt-2 overflow-x-auto">
          <table className="w-full border-collapse text-[13px]" aria-label="Answer key">
            <thead>
              <tr className="border-b border-stone-400 text-left">
                <th className="py-1 pr-3">Variant</th>
                <th className="py-1 pr-3">Conditions</th>
                {a.questions.map((q) => (
                  <th key={q.number} className="py-1 pr-3">
                    Q{q.number}
                  </th>
                ))}
                <th className="no-print py-1 pr-3">Analyses</th>
              </tr>
            </thead>
            <tbody>
              {a.variants.map((v) => (
                <tr key={v.number} className="break-inside-avoid border-b border-stone-200 align-top">
                  <td className="py-1 pr-3 font-semibold tabular-nums">{v.number}</td>
                  <td className="py-1 pr-3 text-[12px] text-stone-700">{condition(v)}</td>
                  {a.questions.map((q) => (
                    <td key={q.number} className="py-1 pr-3 tabular-nums">
                      {answer(v.number, q.number)?.display}
                    </td>
                  ))}
                  <td className="no-print py-1 pr-3 text-[12px]">
                    {analysisOf(v.number).map((x) => (
                      <a key={x.analysisId} href={`/a/${x.analysisId}`} className="mr-2 underline">
                        {x.role === "base" ? "base" : "2 × Cly"}
                      </a>
                    ))}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
        <p className="mt-2 text-[11px] text-stone-500" data-testid="key-caution">
          {CAUTION_LINE}
        </p>
        {a.warnings.length > 0 && (
          <details className="no-print mt-3 text-[12px] text-stone-600">
            <summary className="cursor-pointer">
              {a.warnings.length} draws were replaced because a question had no clear answer there
            </summary>
            <ul className="mt-1 list-disc pl-5">
              {a.warnings.map((w) => (
                <li key={w}>{w}</li>
              ))}
            </ul>
          </details>
        )}
      </section>

      <MarkingPanel instructorId={a.instructorId} questions={a.questions.length} />
    </div>
  );
}
