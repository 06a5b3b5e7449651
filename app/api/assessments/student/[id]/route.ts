import { getStudentAssessment } from "@/lib/service/assessments";
import { respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** The student sheets: questions and conditions, never an answer (read from the student record only). */
export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getStudentAssessment(id)));
}
