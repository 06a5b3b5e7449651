import { deleteAnalysis, getAnalysisRecord, pinAnalysis } from "@/lib/service/analyses";
import { jsonDownload, respond } from "@/lib/service/http";
import { deletionTokenOf } from "@/lib/service/lifecycle";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    // "/api/analyses/{id}.json" arrives here with the suffix: the full JSON export (which keeps the analysis).
    const json = id.endsWith(".json");
    const record = await getAnalysisRecord(json ? id.slice(0, -5) : id);
    if (json) await pinAnalysis(record.id);
    return json ? jsonDownload(record, `analysis-${record.id}.json`) : Response.json(record);
  });
}

/** Deletes the analysis with its deletion token (header x-deletion-token): 204, then 410 Gone. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteAnalysis(id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
