import { deleteAssessment, getInstructorAssessment } from "@/lib/service/assessments";
import { respond } from "@/lib/service/http";
import { deletionTokenOf } from "@/lib/service/lifecycle";

export const dynamic = "force-dynamic";

/** The instructor record, key included: reachable only with the instructor id. */
export async function GET(_req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => Response.json(await getInstructorAssessment(id)));
}

/** Deletes the assessment, both links, with its deletion token (header x-deletion-token): 204, then 410 Gone. */
export async function DELETE(req: Request, ctx: { params: Promise<{ id: string }> }) {
  const { id } = await ctx.params;
  return respond(async () => {
    await deleteAssessment(id, deletionTokenOf(req));
    return new Response(null, { status: 204 });
  });
}
