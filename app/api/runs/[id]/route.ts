import { jsonDownload, respond } from "@/lib/service/http";
import { deletionTokenOf } from "@/lib/service/lifecycle";
import { deleteRunRecord, getRunRecord } from "@/lib/service/runs";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    // "/api/runs/{id}.json" arrives here with the suffix: the full JSON download.
    const json = id.endsWith(".json");
    const record = await getRunRecord(json ? id.slice(0, -5) : id);
    return json ? jsonDownload(record, `run-${record.id}.json`, 0) : Response.json(record);
  });
}

/** Deletes the stored run with the deletion token its job was started with: 204, then 410 Gone. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteRunRecord(id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
