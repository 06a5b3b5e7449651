/**
 * Above the network of a very large mechanism: says that the view is reduced
 * to the reactions carrying the most flux (or, before the analysis, the first
 * ones of the mechanism), with the counts shown, hidden and in all.
 */
import { LARGE_MECHANISM_CAP, type ReactionDetail } from "@/lib/viz/reactionDetail";
import type { MechanismView } from "@/lib/viz/types";
import type { LayoutProgress } from "./useNetworkLayout";

interface Props {
  mechanism: MechanismView;
  detail: ReactionDetail;
  analysed: boolean;
  layout: LayoutProgress;
}

/** A count with thousands separators (2,024), the same on server and client. */
const formatCount = (n: number) => n.toLocaleString("en-US");

export function LargeMechanismNotice({ mechanism, detail, analysed, layout }: Props) {
  const total = mechanism.reactions.length;
  const shown = detail.shown.length;
  return (
    <div
      data-testid="large-notice"
      className="rounded border border-amber-300 bg-amber-50 px-3 py-1 text-[12px] text-amber-950"
    >
      <b className="font-semibold">Large mechanism ({formatCount(mechanism.species.length)} species):</b> showing{" "}
      <span data-testid="large-shown" className="tabular-nums">
        {formatCount(shown)}
      </span>{" "}
      of{" "}
      <span data-testid="large-total" className="tabular-nums">
        {formatCount(total)}
      </span>{" "}
      reactions{" "}
      {analysed ? "(those with the largest flux); " : "(the first in the mechanism, until the analysis ranks them); "}
      hidden: {formatCount(detail.hidden)}
      {detail.zeroFlux ? `, ${formatCount(detail.zeroFlux)} of them with zero flux` : ""}. At most {LARGE_MECHANISM_CAP}{" "}
      reactions are drawn, and only the species they touch.
      {layout.layout ? null : (
        <span className="ml-1 tabular-nums">
          Laying out: {formatCount(layout.placed)} of {formatCount(layout.total)} reactions placed.
        </span>
      )}
    </div>
  );
}
