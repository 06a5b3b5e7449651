"use client";
/**
 * Recomputes the analysis whenever the request changes, through the preview
 * route, which stores nothing. A condition seen recently is repainted from
 * the client's cache at once. Otherwise the hook asks at once after a quiet
 * spell, or waits a moment for a dragged input to settle, cancels the
 * request still in flight (AbortController), and
 * paints only the answer to the newest request, keeping the previous result
 * on screen until it arrives so that nothing jumps. `store()` keeps the
 * analysis on screen for good (a permalink or an export was asked for): the
 * same request, computed again by the deterministic engine, so the stored
 * numbers are those shown.
 *
 * Once a result has stayed on screen for `PREFETCH_AFTER_MS`, the hook also
 * asks for the `neighbours` (the conditions one key step away) that it has not
 * seen, so that the next key step repaints from the cache; a request for a
 * condition already being asked for waits for that answer instead of asking
 * again. A dragged slider changes faster than that, so a drag asks for nothing
 * extra.
 */
import { startTransition, useCallback, useEffect, useRef, useState } from "react";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { recentCache } from "@/lib/viz/recentCache";
import { ApiError } from "../ui/apiClient";
import { previewAnalysis, storeAnalysis } from "./api";

/**
 * Pause after a change before asking the server, ms, when the change before it
 * came less than this long ago (a slider being dragged); a change after a
 * quiet spell (a key step, a typed value) is sent at once.
 */
export const ANALYSIS_DEBOUNCE_MS = 40;

export interface AnalysisState {
  /** the stored analysis on screen; null until its permalink or an export is asked for */
  id: string | null;
  result: AnalysisResult | null;
  loading: boolean;
  error: ApiError | null;
}

/** How long a result stays on screen before its neighbours are asked for, ms. */
export const PREFETCH_AFTER_MS = 60;

type Computed = { id: string | null; result: AnalysisResult };

/**
 * @param request what to compute; null to compute nothing
 * @param initial a stored analysis shown first without recomputing it
 * @param neighbours conditions likely to be asked for next, computed ahead once `request`'s result has painted
 */
export function useAnalysis(
  request: AnalysisRequest | null,
  initial?: { id: string; result: AnalysisResult; request: AnalysisRequest },
  neighbours: AnalysisRequest[] = [],
) {
  const [state, setState] = useState<AnalysisState>({
    id: initial?.id ?? null,
    result: initial?.result ?? null,
    loading: false,
    error: null,
  });
  const key = request ? JSON.stringify(request) : null;
  const shownKey = useRef<string | null>(initial ? JSON.stringify(initial.request) : null);
  const cache = useRef(recentCache<Computed>());
  const lastChange = useRef(Number.NEGATIVE_INFINITY);
  const inFlight = useRef(new Map<string, Promise<AnalysisResult>>());
  const neighbourKeys = neighbours.map((n) => JSON.stringify(n)).join("\n");

  /** The preview of `k`: the request already on its way if there is one, else a new one. */
  const preview = useCallback((k: string, signal?: AbortSignal): Promise<AnalysisResult> => {
    const asked = inFlight.current.get(k);
    if (asked) return asked;
    const p = previewAnalysis(JSON.parse(k) as AnalysisRequest, signal).then((out) => {
      cache.current.set(k, { id: null, result: out.result });
      return out.result;
    });
    inFlight.current.set(k, p);
    const forget = () => inFlight.current.delete(k);
    p.then(forget, forget);
    return p;
  }, []);
  if (initial && !cache.current.get(JSON.stringify(initial.request)))
    cache.current.set(JSON.stringify(initial.request), { id: initial.id, result: initial.result });

  useEffect(() => {
    if (!key) return;
    if (key === shownKey.current) {
      setState((s) => (s.error || s.loading ? { ...s, error: null, loading: false } : s));
      return;
    }
    const hit = cache.current.get(key);
    if (hit) {
      shownKey.current = key;
      setState({ id: hit.id, result: hit.result, loading: false, error: null });
      return;
    }
    const ctrl = new AbortController();
    setState((s) => ({ ...s, loading: true }));
    const now = performance.now();
    const wait = now - lastChange.current < ANALYSIS_DEBOUNCE_MS ? ANALYSIS_DEBOUNCE_MS : 0;
    lastChange.current = now;
    const timer = setTimeout(() => {
      preview(key, ctrl.signal)
        .then((result) => {
          // an answer that arrives after a newer request was made is kept in the cache but not painted
          if (ctrl.signal.aborted) return;
          const first = shownKey.current === null;
          shownKey.current = key;
          const show = () => setState({ id: null, result, loading: false, error: null });
          // the first result fills every panel at once: as a transition React renders it in slices that
          // yield to the browser, where an urgent update would be one long task; later ones stay urgent
          // so that a key step repaints as soon as it can
          if (first) startTransition(show);
          else show();
        })
        .catch((e: unknown) => {
          if ((e as Error).name === "AbortError" || ctrl.signal.aborted) return;
          const err = e instanceof ApiError ? e : new ApiError(0, "client", String((e as Error).message ?? e));
          setState((s) => ({ ...s, loading: false, error: err }));
        });
    }, wait);
    return () => {
      clearTimeout(timer);
      ctrl.abort();
    };
  }, [key, preview]);

  // the neighbours of what is on screen, asked for once it has stayed a moment; their answers go to the cache only
  const shownResult = state.result;
  const prefetching = useRef<AbortController | null>(null);
  useEffect(() => {
    const ctrl = new AbortController();
    prefetching.current = ctrl;
    return () => ctrl.abort();
  }, []);
  useEffect(() => {
    if (!shownResult || !neighbourKeys || shownKey.current !== key) return;
    const timer = setTimeout(() => {
      const signal = prefetching.current?.signal;
      for (const k of neighbourKeys.split("\n"))
        if (!cache.current.get(k) && !inFlight.current.has(k)) preview(k, signal).catch(() => undefined);
    }, PREFETCH_AFTER_MS);
    // a neighbour already on its way is left to finish when the condition changes: the step may be to it
    return () => clearTimeout(timer);
  }, [shownResult, key, neighbourKeys, preview]);

  /** Stores the analysis on screen (once) and resolves to its id. */
  const store = useCallback(async (): Promise<string> => {
    const shown = shownKey.current;
    if (!shown) throw new ApiError(0, "client", "There is no analysis on screen to store yet.");
    const hit = cache.current.get(shown);
    if (hit?.id) return hit.id;
    const out = await storeAnalysis(JSON.parse(shown) as AnalysisRequest);
    cache.current.set(shown, { id: out.id, result: hit?.result ?? out.result });
    if (shownKey.current === shown) setState((s) => ({ ...s, id: out.id }));
    return out.id;
  }, []);

  return { ...state, store };
}
