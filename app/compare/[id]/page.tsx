import type { Metadata } from "next";
import { notFound } from "next/navigation";
import { DeletionTokenNote } from "@/components/DeletionTokenNote";
import { ComparisonView } from "@/components/profile/ComparisonView";
import { recordForPage } from "@/lib/service/pageRecord";
import { getComparisonRecord } from "@/lib/service/profiles";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Profile comparison · Ozone Loss Cycles" };

export default async function ComparisonPage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const record = await recordForPage(getComparisonRecord(id));
  if (!record) notFound();
  return (
    <div className="mx-auto max-w-7xl px-4 py-6">
      <DeletionTokenNote
        what="this comparison (the sweeps it ran stay; the same token deletes each on its own API URL, /api/profiles/{id})"
        deleteUrl={`/api/comparisons/${record.id}`}
      />
      <ComparisonView id={record.id} result={record.body.result} createdAt={record.createdAt} />
    </div>
  );
}
