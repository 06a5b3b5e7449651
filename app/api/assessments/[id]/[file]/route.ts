import { keyJson } from "@/lib/assessment";
import { assessmentCsvExport, assessmentQtiExport, getInstructorAssessment } from "@/lib/service/assessments";
import { csvExportOptions } from "@/lib/service/csvProvenance";
import { csvResponse, jsonDownload, notFound, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** key.csv, answers-template.csv (`?comments=none` for the bare table), key.json and qti.zip (IMS QTI 2.1 package). */
export async function GET(req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    if (file === "key.json") {
      const a = await getInstructorAssessment(id);
      return jsonDownload(keyJson(a), `assessment-${id}-key.json`);
    }
    if (file === "qti.zip") {
      const q = await assessmentQtiExport(id);
      return new Response(Buffer.from(q.zip), {
        headers: { "content-type": "application/zip", "content-disposition": `attachment; filename="${q.filename}"` },
      });
    }
    const out = await assessmentCsvExport(id, file, csvExportOptions(req));
    if (!out) throw notFound("export", file);
    return csvResponse(out.csv, out.filename);
  });
}
