import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { DeletionTokenNote } from "@/components/DeletionTokenNote";
import { SweepView } from "@/components/profile/SweepView";
import { recordForPage } from "@/lib/service/pageRecord";
import { getProfileRecord } from "@/lib/service/profiles";
import { explorerQueryString } from "@/lib/viz/explorerQuery";
import { DETAIL_DEFAULTS } from "@/lib/viz/reactionDetail";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Profile sweep · Ozone Loss Cycles" };

export default async function ProfilePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const record = await recordForPage(getProfileRecord(id));
  if (!record) notFound();
  const r = record.body.result;
  const links = r.levels.map(
    (l) =>
      `/explore?${explorerQueryString({
        mechanismId: l.request.mechanismId,
        condition: l.request.condition,
        view: { colorMode: "flux", showHeld: false, cycle: null, select: null, detail: DETAIL_DEFAULTS.limit },
      })}`,
  );
  // the view needs neither the species nor the per-level requests
  const result = {
    ...r,
    levels: r.levels.map((l) => ({
      ...l,
      species: [],
      request: { mechanismId: "", condition: { altitude_km: l.altitude_km } },
    })),
  };
  return (
    <div className="mx-auto max-w-7xl px-4 py-6">
      <DeletionTokenNote what="this profile sweep" deleteUrl={`/api/profiles/${record.id}`} />
      <SweepView id={record.id} result={result} createdAt={record.createdAt} explorerLinks={links} />
    </div>
  );
}
