import { getAnalysisRecord } from "@/lib/service/analyses";
import { respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    // "/api/analyses/{id}.json" arrives here with the suffix: the full JSON export.
    const json = id.endsWith(".json");
    const record = await getAnalysisRecord(json ? id.slice(0, -5) : id);
    return json
      ? new Response(JSON.stringify(record, null, 2), {
          headers: {
            "content-type": "application/json",
            "content-disposition": `attachment; filename="analysis-${record.id}.json"`,
          },
        })
      : Response.json(record);
  });
}
