import { notFound, redirect } from "next/navigation";
import { InputError } from "@/lib/errors";
import { recordForPage } from "@/lib/service/pageRecord";
import { storeRunHour } from "@/lib/service/runs";

export const dynamic = "force-dynamic";

/** One hour of a stored run opens in the explorer as a stored analysis of that instant (not a steady state). */
export default async function RunHourPage({ params }: { params: Promise<{ id: string; hour: string }> }) {
  const { id, hour } = await params;
  let analysisId: string | null;
  try {
    analysisId = await recordForPage(storeRunHour(id, Number(hour)));
  } catch (e) {
    // an hour the run does not have names nothing, like an unknown run
    if (!(e instanceof InputError && e.path === "hour")) throw e;
    analysisId = null;
  }
  if (!analysisId) notFound();
  redirect(`/a/${analysisId}`);
}
