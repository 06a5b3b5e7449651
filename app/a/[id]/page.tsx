import type { Metadata } from "next";
import { cookies } from "next/headers";
import { notFound } from "next/navigation";
import { Explorer } from "@/components/explorer";
import { getAnalysisRecord, pinAnalysis } from "@/lib/service/analyses";
import { listMechanisms, mechanismDetail } from "@/lib/service/mechanisms";
import { ownerFromCookies } from "@/lib/service/owner";
import { recordForPage } from "@/lib/service/pageRecord";
import { parseExplorerQuery } from "@/lib/viz/explorerQuery";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Stored analysis · Ozone Loss Cycles" };

type Params = Promise<{ id: string }>;
type Search = Promise<Record<string, string | string[] | undefined>>;

/** A permalink: reopens the explorer with the stored request and its stored numbers. */
export default async function AnalysisPage({ params, searchParams }: { params: Params; searchParams: Search }) {
  const { id } = await params;
  const record = await recordForPage(getAnalysisRecord(id));
  if (!record) notFound();
  // an opened permalink is one a user asked for: the draft is kept for good
  await pinAnalysis(id);
  const view = parseExplorerQuery(await searchParams).view;
  const mechanismId = record.request.mechanismId;
  let mechanisms: MechanismSummary[] = [];
  let mechanism: MechanismView | null = null;
  try {
    mechanisms = (await listMechanisms(ownerFromCookies(await cookies()))).mechanisms;
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
