/** The explorer's calls to the service routes (through the shared client, components/ui). */
import type { AnalysisRequest, AnalysisResult } from "@/lib/engine/types";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";
import { type Problem, postJson, requestJson } from "../ui/apiClient";

export const fetchMechanisms = () => requestJson<{ mechanisms: MechanismSummary[] }>("/api/mechanisms");

export const fetchMechanism = (id: string, signal?: AbortSignal) =>
  requestJson<MechanismView>(`/api/mechanisms/${encodeURIComponent(id)}`, { signal });

export const uploadMechanism = (text: string) =>
  postJson<{ id: string; title: string; warnings: Problem[]; deletionToken: string }>("/api/mechanisms", {
    text,
    format: /^\s*[{[]/.test(text) ? "json" : "yaml",
  });

/** An explorer recompute: computed, not stored. */
export const previewAnalysis = (request: AnalysisRequest, signal?: AbortSignal) =>
  postJson<{ result: AnalysisResult }>("/api/analyses/preview", request, signal);

/** Stores the analysis on screen for good (its permalink or an export was asked for): the same request, the same numbers. */
export const storeAnalysis = (request: AnalysisRequest) =>
  postJson<{ id: string; result: AnalysisResult }>("/api/analyses", request);

/** Keeps an analysis for good (its permalink was copied). */
export const pinAnalysis = (id: string) =>
  requestJson<{ id: string; pinned: boolean }>(`/api/analyses/${encodeURIComponent(id)}/pin`, { method: "POST" });
