import { pinAnalysis } from "@/lib/service/analyses";
import { analysisExport } from "@/lib/service/analysisExports";
import { csvExportOptions } from "@/lib/service/csvProvenance";
import { csvResponse, notFound, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** rates.csv, species.csv, cycles.csv, uncertainty.csv, sensitivities.csv; `?comments=none` for the bare table. An export keeps the analysis. */
export async function GET(req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    const out = await analysisExport(id, file, csvExportOptions(req));
    if (!out) throw notFound("export", file);
    await pinAnalysis(id);
    return csvResponse(out.csv, out.filename);
  });
}
