/**
 * One printed student sheet: the variant's conditions and its questions with
 * space for the answers. Rendered on the server from the student record only.
 */
import type { StudentSheet } from "@/lib/assessment/types";
import { CAUTION_LINE } from "@/lib/caution";

interface Props {
  sheet: StudentSheet;
  title: string;
  mechanismTitle: string;
  instructions: string;
  variantCount: number;
}

export function StudentSheetView({ sheet, title, mechanismTitle, instructions, variantCount }: Props) {
  const total = sheet.questions.reduce((s, q) => s + q.points, 0);
  return (
    <article
      className="sheet mx-auto max-w-3xl bg-white p-8 shadow-sm print:max-w-none print:p-0 print:shadow-none"
      aria-label={`Variant ${sheet.variant}`}
      data-variant={sheet.variant}
    >
      <header className="flex items-baseline justify-between border-b-2 border-stone-900 pb-2">
        <h2 className="text-xl font-semibold">
          <bdi>{title}</bdi>
        </h2>
        <p className="text-[15px] font-semibold">
          Variant {sheet.variant} <span className="font-normal text-stone-600">of {variantCount}</span>
        </p>
      </header>
      <div className="mt-4 grid grid-cols-2 gap-6 text-[14px]">
        <p>
          Name: <span className="inline-block w-56 border-b border-stone-500">&nbsp;</span>
        </p>
        <p>
          Student id: <span className="inline-block w-32 border-b border-stone-500">&nbsp;</span>
        </p>
      </div>
      <section className="mt-4" aria-label="Conditions">
        <h3 className="text-[13px] font-semibold uppercase tracking-wider text-stone-600">Conditions</h3>
        <p className="mt-1 text-[13px]">Mechanism: {mechanismTitle}</p>
        <dl className="mt-1 grid grid-cols-2 gap-x-6 gap-y-0.5 text-[13px]">
          {sheet.conditions.map((c) => (
            <div key={c.label} className="flex justify-between border-b border-dotted border-stone-300">
              <dt className="text-stone-700">{c.label}</dt>
              <dd className="tabular-nums font-medium">{c.value}</dd>
            </div>
          ))}
        </dl>
      </section>
      <p className="mt-4 text-[13px] italic text-stone-700">{instructions}</p>
      <ol className="mt-4 space-y-5">
        {sheet.questions.map((q) => (
          <li key={q.number} className="break-inside-avoid text-[14px] leading-relaxed">
            <p>
              <span className="font-semibold">{q.number}.</span> {q.text}{" "}
              <span className="whitespace-nowrap text-[12px] text-stone-500">
                [{q.points} {q.points === 1 ? "mark" : "marks"}]
              </span>
            </p>
            {q.choices && (
              <ul className="mt-1 grid grid-cols-2 gap-x-6 pl-6 text-[13px]">
                {q.choices.map((c) => (
                  <li key={c.letter}>
                    ({c.letter}) {c.text}
                  </li>
                ))}
              </ul>
            )}
            <p className="mt-2 pl-6 text-[13px]">
              Answer: <span className="inline-block w-64 border-b border-stone-500">&nbsp;</span>{" "}
              {q.unit && q.unit !== "dimensionless" ? q.unit : q.unit === "dimensionless" ? "(dimensionless)" : ""}
            </p>
          </li>
        ))}
      </ol>
      <p className="mt-6 text-right text-[12px] text-stone-500">Total: {total} marks</p>
      <p className="mt-4 border-t border-stone-300 pt-1 text-[11px] text-stone-500" data-testid="sheet-caution">
        {CAUTION_LINE}
      </p>
    </article>
  );
}
