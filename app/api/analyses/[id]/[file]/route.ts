import { analysisExport } from "@/lib/service/analysisExports";
import { csvExportOptions } from "@/lib/service/csvProvenance";
import { csvResponse, notFound, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** rates.csv, species.csv, cycles.csv, uncertainty.csv, sensitivities.csv; `?comments=none` for the bare table. */
export async function GET(req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    const out = await analysisExport(id, file, csvExportOptions(req));
    if (!out) throw notFound("export", file);
    return csvResponse(out.csv, out.filename);
  });
}
