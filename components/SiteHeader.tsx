import Link from "next/link";

export function SiteHeader() {
  return (
    <header className="no-print border-b border-stone-300 bg-white/80">
      <nav className="mx-auto flex max-w-7xl items-center gap-6 px-4 py-2 text-sm" aria-label="Main">
        <Link href="/" className="font-semibold tracking-tight text-slate-900">
          Ozone Loss Cycles
        </Link>
        <Link href="/explore" className="text-slate-700 hover:text-slate-950 hover:underline">
          Explorer
        </Link>
      </nav>
    </header>
  );
}
