import type { Metadata } from "next";
import { RunForm } from "@/components/runs/RunForm";
import { profileFormOptions } from "@/lib/service/profiles";
import { runCatalogue } from "@/lib/service/runs";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Runs over days · Ozone Loss Cycles" };

export default async function RunsPage() {
  const { mechanisms } = await profileFormOptions();
  return (
    <div className="mx-auto max-w-4xl space-y-4 px-4 py-8">
      <h1 className="text-2xl font-semibold tracking-tight">Runs over days</h1>
      <p className="text-[14px] leading-relaxed text-stone-700">
        The chemistry of one air parcel integrated over 1–60 days with the sun moving, at a fixed place or along a
        trajectory (a CSV of time, temperature, pressure and latitude). Ozone is solved; the pool totals set the start
        and are then carried by the chemistry. Each day&apos;s Ox loss is split by family and catalytic cycle from the
        pathways of that day&apos;s integrated rates. See docs/runs.md for the trajectory format.
      </p>
      <RunForm mechanisms={mechanisms} demos={runCatalogue().demos} />
    </div>
  );
}
