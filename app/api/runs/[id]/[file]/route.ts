import { csvExportOptions } from "@/lib/service/csvProvenance";
import { csvResponse, notFound, respond } from "@/lib/service/http";
import { runExport } from "@/lib/service/runs";

export const dynamic = "force-dynamic";

export async function GET(req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    const out = await runExport(id, file, csvExportOptions(req));
    if (!out) throw notFound("export", file);
    return csvResponse(out.csv, out.filename);
  });
}
