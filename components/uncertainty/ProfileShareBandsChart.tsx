/** Family shares of the Ox loss against altitude with their 5–95 % Monte Carlo bands (profileBandSeries), in the profile charts' frame. */
import { HoverChart } from "@/components/profile/HoverChart";
import { profileBandReadout, profileBandSeries } from "@/lib/profiles/series/profileBandSeries";
import type { ProfileBand } from "@/lib/uncertainty/bandSeries";

export function ProfileShareBandsChart({ bands, title }: { bands: ProfileBand[]; title: string }) {
  const s = profileBandSeries(bands);
  return (
    <HoverChart
      frame={s.frame}
      title={title}
      testId="profile-share-bands"
      readout={profileBandReadout(bands)}
      legend={s.families.map((f) => ({
        key: f.family,
        label: f.family,
        swatch: (
          <span
            aria-hidden="true"
            className="inline-block h-2.5 w-4 rounded-sm"
            style={{ background: f.fill, border: `1px solid ${f.stroke}` }}
          />
        ),
      }))}
    >
      {(hidden) => {
        const shown = s.families.filter((f) => !hidden.has(f.family));
        return (
          <>
            {shown.map((f) =>
              f.polygons.map((points) => (
                <polygon
                  key={`${f.family}-${points}`}
                  points={points}
                  fill={f.fill}
                  fillOpacity={0.45}
                  stroke="none"
                  data-family={f.family}
                />
              )),
            )}
            {shown.map((f) =>
              f.medianPaths.map((d) => (
                <path key={`${f.family}-${d}`} d={d} fill="none" stroke={f.stroke} strokeWidth={1.4} />
              )),
            )}
          </>
        );
      }}
    </HoverChart>
  );
}
