/**
 * Analyses: validate the request, run it in the engine pool, store the
 * result immutably under an unguessable id. A failed steady state is a
 * stored result with its status; an invalid request stores nothing.
 */
import "server-only";
import { enginePool } from "../engine/pool";
import { parseAnalysisRequest } from "../engine/request-schema";
import type { AnalysisRequest, AnalysisResult } from "../engine/types";
import { ENGINE_VERSION } from "../engine/version";
import { getStore, ID_PATTERN, newRecordId } from "../store";
import { notFound } from "./http";
import { mechanismSource } from "./mechanisms";

export const MAX_ANALYSIS_BODY = 256 * 1024;

export async function createAnalysis(body: unknown): Promise<{ id: string; result: AnalysisResult }> {
  const request = parseAnalysisRequest(body);
  const src = await mechanismSource(request.mechanismId);
  const out = await enginePool().run({ kind: "analysis", mechanism: src, request });
  const result = out.result;
  const id = newRecordId();
  await getStore().putAnalysis({
    id,
    mechanismId: src.id,
    engineVersion: ENGINE_VERSION,
    request,
    result,
    createdAt: new Date().toISOString(),
  });
  return { id, result };
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
  const a = ID_PATTERN.test(id) ? await getStore().getAnalysis(id) : null;
  if (!a) throw notFound("analysis", id);
  return {
    id: a.id,
    createdAt: a.createdAt,
    engineVersion: a.engineVersion,
    currentEngineVersion: ENGINE_VERSION,
    request: a.request as AnalysisRequest,
    result: a.result as AnalysisResult,
  };
}
