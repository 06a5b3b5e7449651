"use client";
/**
 * Recomputes the analysis whenever the request changes: waits for the input
 * to settle (debounce), cancels the request still in flight, and keeps the
 * previous result on screen until the new one arrives so nothing jumps.
 */
import { useEffect, useRef, useState } from "react";
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import { ApiError, postAnalysis } from "./api";

export const ANALYSIS_DEBOUNCE_MS = 350;

export interface AnalysisState {
  id: string | null;
  result: AnalysisResult | null;
  loading: boolean;
  error: ApiError | null;
}

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

  useEffect(() => {
    if (!key) return;
    if (key === shownKey.current) {
      setState((s) => (s.error || s.loading ? { ...s, error: null, loading: false } : s));
      return;
    }
    const ctrl = new AbortController();
    setState((s) => ({ ...s, loading: true }));
    const timer = setTimeout(() => {
      postAnalysis(JSON.parse(key) as AnalysisRequest, ctrl.signal)
        .then((out) => {
          shownKey.current = key;
          setState({ id: out.id, result: out.result, loading: false, error: null });
        })
        .catch((e: unknown) => {
          if ((e as Error).name === "AbortError") return;
          const err = e instanceof ApiError ? e : new ApiError(0, "client", String((e as Error).message ?? e));
          setState((s) => ({ ...s, loading: false, error: err }));
        });
    }, ANALYSIS_DEBOUNCE_MS);
    return () => {
      clearTimeout(timer);
      ctrl.abort();
    };
  }, [key]);

  return state;
}
