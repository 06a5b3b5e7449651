import { getStudentAssessment, revokeStudentLink } from "@/lib/service/assessments";
import { respond } from "@/lib/service/http";
import { deletionTokenOf } from "@/lib/service/lifecycle";

export const dynamic = "force-dynamic";

/** The student sheets: questions and conditions, never an answer (read from the student record only). */
export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getStudentAssessment(id)));
}

/** Revokes a leaked student link with the assessment's deletion token: 204, then 410; the instructor link stays. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await revokeStudentLink(id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
