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

/** An explorer recompute is a draft: it expires unless its permalink is copied, opened or exported. */
export const postAnalysis = (request: AnalysisRequest, signal?: AbortSignal) =>
  postJson<{ id: string; result: AnalysisResult }>("/api/analyses?draft=1", request, signal);

/** Keeps an analysis for good (its permalink was copied). */
export const pinAnalysis = (id: string) =>
  requestJson<{ id: string; pinned: boolean }>(`/api/analyses/${encodeURIComponent(id)}/pin`, { method: "POST" });
