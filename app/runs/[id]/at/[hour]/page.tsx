import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Explorer } from "@/components/explorer";
import { listMechanisms, mechanismDetail } from "@/lib/service/mechanisms";
import { runHourAnalysis } from "@/lib/service/runs";
import { parseExplorerQuery } from "@/lib/viz/explorerQuery";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "A run at one hour · Ozone Loss Cycles" };

type Params = Promise<{ id: string; hour: string }>;
type Search = Promise<Record<string, string | string[] | undefined>>;

/** The explorer at one hour of a stored run: that instant's rates and network, not a steady state. */
export default async function RunHourPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { id, hour } = await params;
  let stored: Awaited<ReturnType<typeof runHourAnalysis>>;
  try {
    stored = await runHourAnalysis(id, Number(hour));
  } catch {
    notFound();
  }
  const view = parseExplorerQuery(await searchParams).view;
  const mechanismId = stored.request.mechanismId;
  let mechanisms: MechanismSummary[] = [];
  let mechanism: MechanismView | null = null;
  try {
    mechanisms = (await listMechanisms()).mechanisms;
    mechanism = { ...(await mechanismDetail(mechanismId)), text: undefined } as MechanismView;
  } catch {
    mechanism = null;
  }
  return (
    <Explorer
      mechanisms={mechanisms}
      initialMechanism={mechanism}
      mechanismId={mechanismId}
      condition={stored.request.condition}
      view={view}
      stored={stored}
    />
  );
}
