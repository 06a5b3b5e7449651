/**
 * Analyses: validate the request, run it in the engine pool, store the
 * result immutably under an unguessable id. A failed steady state is a
 * stored result with its status; an invalid request stores nothing. An
 * explorer recompute is a draft (`draft: true`), which expires unless its
 * permalink is asked for: opened, copied or exported (pinAnalysis).
 */
import "server-only";
import { parseAnalysisRequest } from "../engine/requestSchema";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { ENGINE_VERSION } from "../engine/version";
import { enginePool } from "../runtime/pool";
import { getStore, ID_PATTERN, newRecordId } from "../store";
import { DELETION_NOTE, deleteWithToken, liveOrThrow, newDeletionToken } from "./lifecycle";
import { mechanismSource } from "./mechanisms";
import { keepWithinBudget } from "./retention";

export const MAX_ANALYSIS_BODY = 256 * 1024;

export interface CreatedAnalysis {
  id: string;
  result: AnalysisResult;
  /** shown once: DELETE /api/analyses/{id} with it removes the analysis */
  deletionToken: string;
  deletionNote: string;
}

/** `draft`: an explorer recompute, kept only until OZONE_DRAFT_TTL_DAYS unless pinned. */
export async function createAnalysis(body: unknown, o: { draft?: boolean } = {}): Promise<CreatedAnalysis> {
  const request = parseAnalysisRequest(body);
  const src = await mechanismSource(request.mechanismId);
  const out = await enginePool().run({ kind: "analysis", mechanism: src, request });
  const result = out.result;
  const id = newRecordId();
  const deletion = newDeletionToken();
  await keepWithinBudget();
  await getStore().putAnalysis({
    id,
    mechanismId: src.id,
    engineVersion: ENGINE_VERSION,
    request,
    result,
    createdAt: new Date().toISOString(),
    pinned: !o.draft,
    deleteHash: deletion.hash,
  });
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
  const a = liveOrThrow(ID_PATTERN.test(id) ? await getStore().getAnalysis(id) : null, "analysis", id);
  return {
    id: a.id,
    createdAt: a.createdAt,
    engineVersion: a.engineVersion,
    currentEngineVersion: ENGINE_VERSION,
    request: a.request as AnalysisRequest,
    result: a.result as AnalysisResult,
  };
}
