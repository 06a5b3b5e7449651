import { answerTemplateCsv, keyCsv, keyJson } from "@/lib/assessment";
import { getInstructorAssessment } from "@/lib/service/assessments";
import { csvResponse, notFound, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

const FILES = ["key.csv", "key.json", "answers-template.csv"] as const;

export async function GET(_req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    if (!FILES.includes(file as (typeof FILES)[number])) throw notFound("export", file);
    const a = await getInstructorAssessment(id);
    if (file === "key.csv") return csvResponse(keyCsv(a), `assessment-${id}-key.csv`);
    if (file === "answers-template.csv")
      return csvResponse(answerTemplateCsv(a.questions.length, a.variants.length), `assessment-${id}-answers.csv`);
    return new Response(JSON.stringify(keyJson(a), null, 2), {
      headers: {
        "content-type": "application/json",
        "content-disposition": `attachment; filename="assessment-${id}-key.json"`,
      },
    });
  });
}
