import type { Metadata } from "next";
import { cookies } from "next/headers";
import { ComparisonForm } from "@/components/profile/ComparisonForm";
import { ownerFromCookies } from "@/lib/service/owner";
import { profileFormOptions } from "@/lib/service/profiles";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Compare profiles · Ozone Loss Cycles" };

export default async function ComparePage({
  searchParams,
}: {
  searchParams: Promise<Record<string, string | string[] | undefined>>;
}) {
  const q = await searchParams;
  const a = typeof q.a === "string" && /^[A-Za-z0-9_-]{1,80}$/.test(q.a) ? q.a : undefined;
  const { mechanisms, profiles } = await profileFormOptions(ownerFromCookies(await cookies()));
  return (
    <div className="mx-auto max-w-5xl space-y-4 px-4 py-8">
      <h1 className="text-2xl font-semibold tracking-tight">Compare two profiles</h1>
      <p className="text-[14px] leading-relaxed text-stone-700">
        Two profiles, one profile under two mechanisms, or two sets of pool totals, side by side: the Ox loss rate and
        its split by family against altitude for A and B, the difference B − A, and at each altitude the cycles whose
        change explains most of it. The result is stored and has a permalink.
      </p>
      <ComparisonForm mechanisms={mechanisms} profiles={profiles} initialA={a} />
    </div>
  );
}
