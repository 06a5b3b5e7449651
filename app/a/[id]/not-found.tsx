import Link from "next/link";

export default function AnalysisNotFound() {
  return (
    <div className="mx-auto max-w-xl px-4 py-16">
      <h1 className="text-2xl font-semibold">No stored analysis under this address</h1>
      <p className="mt-3 text-stone-700">
        The link may be mistyped or cut short. Permalinks look like <code>/a/</code> followed by a long id.
      </p>
      <p className="mt-6">
        <Link href="/explore" className="underline">
          Open the explorer
        </Link>
      </p>
    </div>
  );
}
