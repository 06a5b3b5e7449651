/**
 * The preset layout of a mechanism for the explorer, computed after the page
 * has hydrated and in slices of at most SLICE_MS of work, with a yield to the
 * event loop between them, so that neither hydration nor the page's answer to
 * input waits for a layout (a large one takes seconds; even the reference
 * mechanism's took a third of the hydration task). Same positions as
 * networkLayout (networkLayoutSteps is networkLayout one reaction at a time);
 * null until the layout is done.
 */
import { useEffect, useState } from "react";
import { type NetworkLayout, networkLayoutSteps } from "@/lib/viz/networkLayout";
import type { MechanismView } from "@/lib/viz/types";
import { nextTask } from "./nextTask";

/** Work per slice, ms. */
const SLICE_MS = 30;

export interface LayoutProgress {
  layout: NetworkLayout | null;
  /** reactions placed so far, and of how many (both 0 without a mechanism) */
  placed: number;
  total: number;
}

export function useNetworkLayout(mechanism: MechanismView | null): LayoutProgress {
  const [done, setDone] = useState<{ mechanism: MechanismView; layout: NetworkLayout } | null>(null);
  const [placed, setPlaced] = useState(0);

  useEffect(() => {
    if (!mechanism) return;
    let cancelled = false;
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
      void nextTask().then(slice);
    };
    void nextTask().then(slice);
    return () => {
      cancelled = true;
    };
  }, [mechanism]);

  if (!mechanism) return { layout: null, placed: 0, total: 0 };
  const total = mechanism.reactions.length;
  const layout = done?.mechanism === mechanism ? done.layout : null;
  return { layout, placed: layout ? total : placed, total };
}
