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
 */
import { useCallback, useEffect, useRef, useState } from "react";
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

type Computed = { id: string | null; result: AnalysisResult };

/**
 * @param request what to compute; null to compute nothing
 * @param initial a stored analysis shown first without recomputing it
 */
export function useAnalysis(
  request: AnalysisRequest | null,
  initial?: { id: string; result: AnalysisResult; request: AnalysisRequest },
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
      previewAnalysis(JSON.parse(key) as AnalysisRequest, ctrl.signal)
        .then((out) => {
          cache.current.set(key, { id: null, result: out.result });
          // an answer that arrives after a newer request was made is kept in the cache but not painted
          if (ctrl.signal.aborted) return;
          shownKey.current = key;
          setState({ id: null, result: out.result, loading: false, error: null });
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
  }, [key]);

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
