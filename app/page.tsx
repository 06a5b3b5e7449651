import Link from "next/link";

export default function Home() {
  return (
    <div className="mx-auto max-w-3xl px-4 py-16">
      <h1 className="text-3xl font-semibold tracking-tight">Ozone Loss Cycles</h1>
      <p className="mt-4 text-lg leading-relaxed text-slate-700">
        Load a chemical mechanism, pick a place and time in the stratosphere, and this tool computes the photochemical
        steady state, the rate of every reaction and the odd-oxygen budget split among the pure-oxygen, HOx, NOx, ClOx
        and BrOx families. For each catalytic cycle it finds by pathway analysis it reports the rate, the rate-limiting
        step and the chain length, and it draws the reaction network coloured by flux and by ozone destroyed.
      </p>
      <p className="mt-8">
        <Link
          href="/explore"
          className="inline-block rounded bg-slate-900 px-5 py-2.5 font-medium text-white hover:bg-slate-700 focus:outline-2 focus:outline-offset-2"
        >
          Open the explorer
        </Link>
      </p>
    </div>
  );
}
