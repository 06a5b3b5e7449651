import { notFound, redirect } from "next/navigation";
import { storeRunHour } from "@/lib/service/runs";

export const dynamic = "force-dynamic";

/** One hour of a stored run opens in the explorer as a stored analysis of that instant (not a steady state). */
export default async function RunHourPage({ params }: { params: Promise<{ id: string; hour: string }> }) {
  const { id, hour } = await params;
  let analysisId: string;
  try {
    analysisId = await storeRunHour(id, Number(hour));
  } catch {
    notFound();
  }
  redirect(`/a/${analysisId}`);
}
