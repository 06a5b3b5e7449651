import type { Metadata } from "next";
import { cookies } from "next/headers";
import Link from "next/link";
import { SweepForm } from "@/components/profile/SweepForm";
import { ownerFromCookies } from "@/lib/service/owner";
import { profileFormOptions } from "@/lib/service/profiles";

export const dynamic = "force-dynamic";
export const metadata: Metadata = { title: "Profile sweep · Ozone Loss Cycles" };

export default async function ProfilesPage() {
  const { mechanisms, profiles } = await profileFormOptions(ownerFromCookies(await cookies()));
  return (
    <div className="mx-auto max-w-4xl space-y-4 px-4 py-8">
      <h1 className="text-2xl font-semibold tracking-tight">Profile sweep</h1>
      <p className="text-[14px] leading-relaxed text-stone-700">
        The steady state and the catalytic cycles at every level of a profile, each level warm-started from its
        neighbour, with the Ox loss rate and its split by family against altitude. Use the default profile (U.S.
        Standard Atmosphere 1976 with the default climatology), one of the two invented demo profiles, or upload your
        own CSV. To put two profiles side by side,{" "}
        <Link className="underline" href="/compare">
          compare them
        </Link>
        .
      </p>
      <SweepForm mechanisms={mechanisms} profiles={profiles} />
      <ProfileFormatHelp />
    </div>
  );
}

function ProfileFormatHelp() {
  return (
    <details className="rounded border border-stone-300 bg-white px-3 py-2 text-[13px]">
      <summary className="cursor-pointer font-medium">CSV profile format</summary>
      <div className="mt-2 space-y-2 text-stone-700">
        <p>
          One header row of <code>name (unit)</code> cells, then one row per level. Required: <code>altitude (km)</code>{" "}
          (or m), <code>T (K)</code>, and <code>p</code> in Pa, hPa, mbar, atm or Torr. Optional: held species such as{" "}
          <code>H2O (ppmv)</code> and pool totals <code>Cly</code>, <code>Bry</code>, <code>NOy</code> (or{" "}
          <code>total:X</code>) in mol/mol, ppmv, ppbv, pptv or cm-3. Lines starting with <code># title:</code> and{" "}
          <code># note:</code> name the profile. Altitudes must be strictly monotonic.
        </p>
        <pre className="overflow-x-auto rounded bg-stone-50 p-2 text-[11px]">
          {
            "# title: my profile\naltitude (km),T (K),p (hPa),H2O (ppmv),Cly (ppbv)\n20,216.7,55.3,4.5,2.1\n25,221.6,25.5,5.0,2.9\n30,226.5,12.0,5.4,3.3"
          }
        </pre>
      </div>
    </details>
  );
}
