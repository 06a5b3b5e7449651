import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { PrintButton, StudentSheetView } from "@/components/assessment";
import type { StudentAssessment } from "@/lib/assessment/types";
import { getStudentAssessment } from "@/lib/service/assessments";
import { recordForPage } from "@/lib/service/pageRecord";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Assessment sheets · Ozone Loss Cycles", robots: { index: false } };

type Search = Promise<Record<string, string | string[] | undefined>>;

/** The student link: reads the student record only, which holds no answers. */
export default async function StudentSheetsPage({
  params,
  searchParams,
}: {
  params: Promise<{ id: string }>;
  searchParams: Search;
}) {
  const { id } = await params;
  const v = Number((await searchParams).v);
  const found: StudentAssessment | null = await recordForPage(getStudentAssessment(id));
  if (!found) notFound();
  const a = found;
  const sheets =
    Number.isInteger(v) && v >= 1 && v <= a.sheets.length ? a.sheets.filter((s) => s.variant === v) : a.sheets;
  return (
    <div className="px-4 py-6 print:p-0">
      <div className="no-print mx-auto mb-6 max-w-3xl space-y-3">
        <h1 className="text-2xl font-semibold tracking-tight">
          <bdi>{a.title}</bdi>
        </h1>
        <p className="text-[14px] text-stone-700">
          {a.sheets.length} variants on <bdi>{a.mechanism.title}</bdi>. Print for paper copies, or choose “Save as PDF”
          in the print dialogue; each variant starts on a new page.
        </p>
        <div className="flex flex-wrap items-center gap-3">
          <PrintButton label={sheets.length === 1 ? "Print this sheet" : `Print ${sheets.length} sheets`} />
          <nav aria-label="Variants" className="flex flex-wrap gap-1 text-[13px]">
            <a
              href={`/assess/s/${id}`}
              className="rounded border border-stone-300 px-2 py-0.5 hover:bg-stone-100"
              aria-current={sheets.length > 1 ? "page" : undefined}
            >
              All
            </a>
            {a.sheets.map((s) => (
              <a
                key={s.variant}
                href={`/assess/s/${id}?v=${s.variant}`}
                className="rounded border border-stone-300 px-2 py-0.5 tabular-nums hover:bg-stone-100"
                aria-current={sheets.length === 1 && sheets[0].variant === s.variant ? "page" : undefined}
                aria-label={`Variant ${s.variant}`}
              >
                {s.variant}
              </a>
            ))}
          </nav>
        </div>
      </div>
      <div className="space-y-8 print:space-y-0">
        {sheets.map((s) => (
          <StudentSheetView
            key={s.variant}
            sheet={s}
            title={a.title}
            mechanismTitle={a.mechanism.title}
            instructions={a.instructions}
            variantCount={a.sheets.length}
          />
        ))}
      </div>
    </div>
  );
}
