/**
 * Analyses: validate the request, run it in the engine pool, store the
 * result immutably under an unguessable id. A failed steady state is a
 * stored result with its status; an invalid request stores nothing. An
 * explorer recompute is a preview (previewAnalysis): computed the same way
 * and returned, nothing stored; the explorer stores it (createAnalysis, the
 * same request, so the same numbers) only when its permalink or an export is
 * asked for. A draft (`draft: true`, the older explorer's recompute) expires
 * unless its permalink is opened, copied or exported (pinAnalysis).
 */
import "server-only";
import { parseAnalysisRequest } from "../engine/requestSchema";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { enginePool } from "../runtime/pool";
import { getStore } from "../store";
import { DELETION_NOTE, deleteWithToken, newDeletionToken } from "./lifecycle";
import { mechanismSource } from "./mechanisms";
import { liveAnalysis, provenanceOf, putNewAnalysis } from "./records";
import { keepWithinBudget } from "./retention";

export const MAX_ANALYSIS_BODY = 256 * 1024;

export interface CreatedAnalysis {
  id: string;
  result: AnalysisResult;
  /** shown once: DELETE /api/analyses/{id} with it removes the analysis */
  deletionToken: string;
  deletionNote: string;
}

/** The analysis of a request, computed as createAnalysis computes it and stored nowhere: the explorer's slider steps. */
export async function previewAnalysis(body: unknown): Promise<{ result: AnalysisResult }> {
  return { result: (await compute(body)).result };
}

/** One request's analysis in the engine pool: the one composition both routes share. */
async function compute(body: unknown) {
  const request = parseAnalysisRequest(body);
  const src = await mechanismSource(request.mechanismId);
  const out = await enginePool().run({ kind: "analysis", mechanism: src, request });
  return { request, mechanismId: src.id, result: out.result };
}

/** `draft`: an explorer recompute, kept only until OZONE_DRAFT_TTL_DAYS unless pinned. */
export async function createAnalysis(body: unknown, o: { draft?: boolean } = {}): Promise<CreatedAnalysis> {
  const { request, mechanismId, result } = await compute(body);
  const deletion = newDeletionToken();
  await keepWithinBudget();
  const id = await putNewAnalysis({ mechanismId, request, result, pinned: !o.draft }, { deleteHash: deletion.hash });
  return { id, result, deletionToken: deletion.token, deletionNote: DELETION_NOTE };
}

/** The permalink was asked for (page opened, link copied, a table exported): the analysis is kept for good. */
export async function pinAnalysis(id: string): Promise<void> {
  await getAnalysisRecord(id);
  await getStore().pinAnalysis(id);
}

export async function deleteAnalysis(id: string, token: string | null): Promise<void> {
  await deleteWithToken([{ kind: "analysis", id }], token, "analysis");
}

export interface AnalysisRecord {
  id: string;
  createdAt: string;
  engineVersion: string;
  currentEngineVersion: string;
  request: AnalysisRequest;
  result: AnalysisResult;
}

export async function getAnalysisRecord(id: string): Promise<AnalysisRecord> {
  const a = await liveAnalysis(id);
  return { ...provenanceOf(a), request: a.request as AnalysisRequest, result: a.result as AnalysisResult };
}
