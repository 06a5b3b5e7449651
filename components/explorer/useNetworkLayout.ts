/**
 * The preset layout of a mechanism for the explorer. A small mechanism is laid
 * out at once, in the render (as before); a large one (more reactions than
 * SLICED_ABOVE_REACTIONS) in slices of at most SLICE_MS of work, with a
 * yield to the event loop between them, so that the page keeps answering
 * input while a layout of seconds runs. Same positions either way
 * (networkLayoutSteps is networkLayout one reaction at a time); null while a
 * sliced layout is still running.
 */
import { useEffect, useMemo, useState } from "react";
import { type NetworkLayout, networkLayout, networkLayoutSteps } from "@/lib/viz/networkLayout";
import type { MechanismView } from "@/lib/viz/types";

/** Above this many reactions the layout runs in slices. */
export const SLICED_ABOVE_REACTIONS = 400;
/** Work per slice, ms. */
const SLICE_MS = 30;

export interface LayoutProgress {
  layout: NetworkLayout | null;
  /** reactions placed so far, and of how many (both 0 without a mechanism) */
  placed: number;
  total: number;
}

export function useNetworkLayout(mechanism: MechanismView | null): LayoutProgress {
  const sliced = !!mechanism && mechanism.reactions.length > SLICED_ABOVE_REACTIONS;
  const direct = useMemo(() => (mechanism && !sliced ? networkLayout(mechanism) : null), [mechanism, sliced]);
  const [done, setDone] = useState<{ mechanism: MechanismView; layout: NetworkLayout } | null>(null);
  const [placed, setPlaced] = useState(0);

  useEffect(() => {
    if (!mechanism || !sliced) return;
    let cancelled = false;
    let timer: ReturnType<typeof setTimeout> | undefined;
    const steps = networkLayoutSteps(mechanism);
    setPlaced(0);
    const slice = () => {
      if (cancelled) return;
      const end = performance.now() + SLICE_MS;
      let step = steps.next();
      while (!step.done && performance.now() < end) step = steps.next();
      if (step.done) {
        setDone({ mechanism, layout: step.value });
        return;
      }
      setPlaced(step.value);
      timer = setTimeout(slice, 0);
    };
    timer = setTimeout(slice, 0);
    return () => {
      cancelled = true;
      clearTimeout(timer);
    };
  }, [mechanism, sliced]);

  if (!mechanism) return { layout: null, placed: 0, total: 0 };
  const total = mechanism.reactions.length;
  if (!sliced) return { layout: direct, placed: total, total };
  const layout = done?.mechanism === mechanism ? done.layout : null;
  return { layout, placed: layout ? total : placed, total };
}
