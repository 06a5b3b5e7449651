import Link from "next/link";

const LINKS = [
  { href: "/explore", label: "Explorer" },
  { href: "/profiles", label: "Profiles" },
  { href: "/runs", label: "Runs" },
  { href: "/compare", label: "Compare" },
  { href: "/assess", label: "Assessments" },
] as const;

export function SiteHeader() {
  return (
    <header className="no-print border-b border-stone-300 bg-white/80">
      <nav
        className="mx-auto flex max-w-7xl flex-wrap items-center gap-x-6 gap-y-1 px-4 py-2 text-sm"
        aria-label="Main"
      >
        <Link href="/" className="font-semibold tracking-tight text-slate-900">
          Ozone Loss Cycles
        </Link>
        {LINKS.map((l) => (
          <Link key={l.href} href={l.href} className="text-slate-700 hover:text-slate-950 hover:underline">
            {l.label}
          </Link>
        ))}
      </nav>
    </header>
  );
}
