import { getInstructorAssessment } from "@/lib/service/assessments";
import { respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

/** The instructor record, key included: reachable only with the instructor id. */
export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getInstructorAssessment(id)));
}
