import type { Metadata } from "next";
import { cookies } from "next/headers";
import { Explorer } from "@/components/explorer";
import { listMechanisms, mechanismDetail } from "@/lib/service/mechanisms";
import { ownerFromCookies } from "@/lib/service/owner";
import { parseExplorerQuery } from "@/lib/viz/explorerQuery";
import { LARGE_MECHANISM_SPECIES } from "@/lib/viz/networkElements";
import type { MechanismSummary, MechanismView } from "@/lib/viz/types";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Explorer · Ozone Loss Cycles" };

type Search = Promise<Record<string, string | string[] | undefined>>;

/** Reads the condition from the address and hands the explorer the mechanism list and the chosen mechanism. */
export default async function ExplorePage({ searchParams }: { searchParams: Search }) {
  const q = parseExplorerQuery(await searchParams);
  const { mechanisms, mechanism } = await loadMechanisms(q.mechanismId);
  return (
    <Explorer
      mechanisms={mechanisms}
      initialMechanism={mechanism}
      mechanismId={q.mechanismId}
      condition={q.condition}
      view={q.view}
      queryWarnings={q.warnings}
    />
  );
}

/** Server-side first look-up; on failure the explorer fetches them itself and shows the error where it happens. */
async function loadMechanisms(
  id: string,
): Promise<{ mechanisms: MechanismSummary[]; mechanism: MechanismView | null }> {
  let mechanisms: MechanismSummary[] = [];
  let mechanism: MechanismView | null = null;
  try {
    mechanisms = (await listMechanisms(ownerFromCookies(await cookies()))).mechanisms;
  } catch {
    mechanisms = [];
  }
  try {
    const d = await mechanismDetail(id);
    // a very large mechanism is fetched by the browser instead: inlined in the page, its megabytes of
    // props made hydration one long task
    mechanism = d.species.length > LARGE_MECHANISM_SPECIES ? null : ({ ...d, text: undefined } as MechanismView);
  } catch {
    mechanism = null;
  }
  return { mechanisms, mechanism };
}
