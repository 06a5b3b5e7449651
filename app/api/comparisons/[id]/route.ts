import { jsonDownload, respond } from "@/lib/service/http";
import { deleteSweepRecord } from "@/lib/service/jobs";
import { deletionTokenOf } from "@/lib/service/lifecycle";
import { getComparisonRecord } from "@/lib/service/profiles";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    const json = id.endsWith(".json");
    const record = await getComparisonRecord(json ? id.slice(0, -5) : id);
    return json ? jsonDownload(record, `comparison-${record.id}.json`) : Response.json(record);
  });
}

/** Deletes the stored comparison with the deletion token its job was started with: 204, then 410 Gone. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteSweepRecord("comparison", id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
