import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { Explorer } from "@/components/explorer";
import { getAnalysisRecord } from "@/lib/service/analyses";
import { listMechanisms, mechanismDetail } from "@/lib/service/mechanisms";
import { parseExplorerQuery } from "@/lib/viz/explorerQuery";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Stored analysis · Ozone Loss Cycles" };

type Params = Promise<{ id: string }>;
type Search = Promise<Record<string, string | string[] | undefined>>;

/** A permalink: reopens the explorer with the stored request and its stored numbers. */
export default async function AnalysisPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { id } = await params;
  let record: Awaited<ReturnType<typeof getAnalysisRecord>>;
  try {
    record = await getAnalysisRecord(id);
  } catch {
    notFound();
  }
  const view = parseExplorerQuery(await searchParams).view;
  const mechanismId = record.request.mechanismId;
  let mechanisms: MechanismSummary[] = [];
  let mechanism: MechanismView | null = null;
  try {
    mechanisms = (await listMechanisms()).mechanisms;
  } catch {
    mechanisms = [];
  }
  try {
    mechanism = { ...(await mechanismDetail(mechanismId)), text: undefined } as MechanismView;
  } catch {
    mechanism = null;
  }
  return (
    <Explorer
      mechanisms={mechanisms}
      initialMechanism={mechanism}
      mechanismId={mechanismId}
      condition={record.request.condition}
      view={view}
      stored={record}
    />
  );
}
