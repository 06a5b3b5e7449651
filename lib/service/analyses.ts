/**
 * Analyses: validate the request, run it in the engine pool, store the
 * result immutably under an unguessable id. A failed steady state is a
 * stored result with its status; an invalid request stores nothing. An
 * explorer recompute is a preview (previewAnalysisJson): computed the same way
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
import { ResultCache, resultKey } from "./resultCache";
import { keepWithinBudget } from "./retention";

export const MAX_ANALYSIS_BODY = 256 * 1024;

export interface CreatedAnalysis {
  id: string;
  result: AnalysisResult;
  /** shown once: DELETE /api/analyses/{id} with it removes the analysis */
  deletionToken: string;
  deletionNote: string;
}

const recent = new ResultCache();

/**
 * The analysis of a request, computed as createAnalysis computes it and stored
 * nowhere (the explorer's slider steps): the JSON text of the result, as the
 * worker wrote it or from the cache of recent results, sent without being
 * parsed or written again.
 */
export async function previewAnalysisJson(body: unknown): Promise<Uint8Array> {
  return (await computeJson(body)).json;
}

/** The one composition both routes share: a recent identical request's result, or the engine pool's. */
async function computeJson(body: unknown) {
  const request = parseAnalysisRequest(body);
  const src = await mechanismSource(request.mechanismId);
  const key = resultKey(src.id, request);
  let json = recent.get(key);
  if (!json) {
    json = (await enginePool().run({ kind: "analysis-json", mechanism: src, request })).result;
    recent.set(key, json);
  }
  return { request, mechanismId: src.id, json };
}

const decoder = new TextDecoder();

/**
 * `draft`: an explorer recompute, kept only until OZONE_DRAFT_TTL_DAYS unless
 * pinned. `resultJson` is the result's JSON text, for a response that need not
 * write it again (createdAnalysisBody).
 */
export async function createAnalysis(
  body: unknown,
  o: { draft?: boolean } = {},
): Promise<CreatedAnalysis & { resultJson: Uint8Array }> {
  const { request, mechanismId, json } = await computeJson(body);
  const result = JSON.parse(decoder.decode(json)) as AnalysisResult;
  const deletion = newDeletionToken();
  await keepWithinBudget();
  const id = await putNewAnalysis(
    { mechanismId, request, result, resultJson: json, pinned: !o.draft },
    { deleteHash: deletion.hash },
  );
  return { id, result, resultJson: json, deletionToken: deletion.token, deletionNote: DELETION_NOTE };
}

/** The pieces of the JSON of a CreatedAnalysis, in its field order, with the result's text as it is. */
export function createdAnalysisBody(out: CreatedAnalysis & { resultJson: Uint8Array }): (string | Uint8Array)[] {
  const s = JSON.stringify;
  return [
    `{"id":${s(out.id)},"result":`,
    out.resultJson,
    `,"deletionToken":${s(out.deletionToken)},"deletionNote":${s(out.deletionNote)}}`,
  ];
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
