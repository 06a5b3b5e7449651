import Link from "next/link";

const TOOLS = [
  {
    href: "/explore",
    title: "Explorer",
    text: "One place and time: the steady state, the reaction network coloured by flux and by ozone destroyed, the cycles and the odd-oxygen budget.",
  },
  {
    href: "/profiles",
    title: "Profiles",
    text: "Sweep an altitude profile and see how the loss is split among the families at every level.",
  },
  {
    href: "/runs",
    title: "Runs over days",
    text: "One air parcel over 1–60 days with the sun moving, at a fixed place or along a trajectory: ozone lost day by day, split by family and cycle.",
  },
  {
    href: "/compare",
    title: "Compare",
    text: "Two profiles, mechanisms or loadings side by side, with the difference and the cycles that explain it.",
  },
  {
    href: "/assess",
    title: "Assessments",
    text: "For instructors: question variants with answer keys computed by the same engine, printable sheets and marking.",
  },
  {
    href: "/api/openapi.json",
    title: "From scripts",
    text: "The same engine from the command line (npx ozone-cycles analyse, sweep, compare) or over HTTP; the OpenAPI document lists every route.",
  },
] as const;

export default function Home() {
  return (
    <div className="mx-auto max-w-4xl px-4 py-14">
      <h1 className="text-3xl font-semibold tracking-tight">Ozone Loss Cycles</h1>
      <p className="mt-4 text-lg leading-relaxed text-slate-700">
        Load a chemical mechanism, pick a place and time in the stratosphere, and this tool computes the photochemical
        steady state, the rate of every reaction and the odd-oxygen budget split among the pure-oxygen, HOx, NOx, ClOx
        and BrOx families. For each catalytic cycle it finds by pathway analysis it reports the rate, the rate-limiting
        step and the chain length, and it draws the reaction network coloured by flux and by ozone destroyed. Light
        includes scattered sunlight; cold sulfate, NAT and ice surfaces activate chlorine; and a parcel can be followed
        over days.
      </p>
      <p className="mt-8">
        <Link
          href="/explore"
          className="inline-block rounded bg-slate-900 px-5 py-2.5 font-medium text-white hover:bg-slate-700 focus:outline-2 focus:outline-offset-2"
        >
          Open the explorer
        </Link>
      </p>
      <ul className="mt-10 grid gap-4 sm:grid-cols-2">
        {TOOLS.map((t) => (
          <li key={t.href} className="rounded border border-stone-300 bg-white p-4">
            <Link href={t.href} className="font-medium text-slate-900 underline-offset-2 hover:underline">
              {t.title}
            </Link>
            <p className="mt-1 text-sm text-slate-600">{t.text}</p>
          </li>
        ))}
      </ul>
    </div>
  );
}
