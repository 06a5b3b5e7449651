import type { Metadata } from "next";
import Link from "next/link";
import { GONE_WHAT, type GoneWhat } from "@/lib/service/recordPages";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Deleted · Ozone Loss Cycles", robots: { index: false } };

type Search = Promise<Record<string, string | string[] | undefined>>;

/** Shown with status 410 (proxy.ts) at the address of a record that was deleted or has expired. */
export default async function GonePage({ searchParams }: { searchParams: Search }) {
  const what = (await searchParams).what;
  const label = typeof what === "string" && Object.hasOwn(GONE_WHAT, what) ? GONE_WHAT[what as GoneWhat] : "record";
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-semibold">{`This ${label} was deleted`}</h1>
      <p className="mt-3 text-stone-700">
        Whoever held its deletion token removed it, or, for an explorer draft that was never shared, it expired. The
        link will not work again: nothing of the record is kept but the note that it existed.
      </p>
      <p className="mt-6 text-stone-700">
        A new analysis starts in the{" "}
        <Link href="/explore" className="underline">
          explorer
        </Link>
        .
      </p>
    </div>
  );
}
