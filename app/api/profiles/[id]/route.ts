import { jsonDownload, respond } from "@/lib/service/http";
import { deleteSweepRecord } from "@/lib/service/jobs";
import { deletionTokenOf } from "@/lib/service/lifecycle";
import { getProfileRecord } from "@/lib/service/profiles";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    // "/api/profiles/{id}.json" arrives here with the suffix: the full JSON download.
    const json = id.endsWith(".json");
    const record = await getProfileRecord(json ? id.slice(0, -5) : id);
    return json ? jsonDownload(record, `profile-${record.id}.json`) : Response.json(record);
  });
}

/** Deletes the stored profile with the deletion token its job was started with: 204, then 410 Gone. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteSweepRecord("profile", id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
