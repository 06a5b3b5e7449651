import { MAX_ANSWERS_BODY, markAssessment } from "@/lib/service/assessments";
import { csvExportOptions } from "@/lib/service/csvProvenance";
import { csvResponse, HttpError, readBodyText, readJsonBody, respond } from "@/lib/service/http";
import { limitRequest } from "@/lib/service/rateLimit";

export const dynamic = "force-dynamic";

/** Body: the class's answers as CSV (or JSON { csv }). Answers JSON marks, or CSV with ?format=csv (and ?comments=none for the bare table). */
export async function POST(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await limitRequest(req);
    let text: string;
    if ((req.headers.get("content-type") ?? "").includes("json")) {
      const csv = ((await readJsonBody(req, MAX_ANSWERS_BODY)) as { csv?: unknown } | null)?.csv;
      if (typeof csv !== "string") throw new HttpError(400, "invalid-request", "expected { csv: string }", "csv");
      text = csv;
    } else text = await readBodyText(req, MAX_ANSWERS_BODY);
    const marks = await markAssessment(id, text, csvExportOptions(req));
    if (new URL(req.url).searchParams.get("format") === "csv")
      return csvResponse(marks.csv, `assessment-${id}-marks.csv`);
    return Response.json(marks);
  });
}
