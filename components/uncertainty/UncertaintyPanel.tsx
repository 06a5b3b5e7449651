/** What an analysis's `result.uncertainty` holds: the ranked sensitivities, the Monte Carlo ranges and the share bands. */
import { shareBands } from "@/lib/uncertainty/bandSeries";
import type { UncertaintyResult } from "@/lib/uncertainty/types";
import { RangeTable } from "./RangeTable";
import { SensitivityTable } from "./SensitivityTable";
import { ShareRangeBars } from "./ShareRangeBars";

export function UncertaintyPanel({ uncertainty }: { uncertainty: UncertaintyResult }) {
  const mc = uncertainty.monteCarlo;
  return (
    <section aria-labelledby="uncertainty-title" className="rounded-md border border-stone-300 bg-white">
      <header className="border-b border-stone-200 px-3 py-1.5">
        <h2 id="uncertainty-title" className="text-[13px] font-semibold tracking-wide text-stone-800">
          Kinetic uncertainty
        </h2>
      </header>
      {uncertainty.warnings.map((w) => (
        <p key={w} className="px-3 pt-1.5 text-[11px] text-stone-600">
          {w}
        </p>
      ))}
      {mc && (
        <>
          <div className="px-3 pt-2">
            <ShareRangeBars bands={shareBands(mc)} />
          </div>
          <RangeTable mc={mc} />
        </>
      )}
      {uncertainty.sensitivity && <SensitivityTable report={uncertainty.sensitivity} />}
    </section>
  );
}
