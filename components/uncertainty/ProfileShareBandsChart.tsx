/** Family shares of the Ox loss against altitude with their 5–95 % Monte Carlo bands (profileBandSeries), in the profile charts' frame. */
import { ChartAxes } from "@/components/profile/ChartAxes";
import { profileBandSeries } from "@/lib/profiles/series/profileBandSeries";
import type { ProfileBand } from "@/lib/uncertainty/bandSeries";

export function ProfileShareBandsChart({ bands, title }: { bands: ProfileBand[]; title: string }) {
  const s = profileBandSeries(bands);
  return (
    <figure data-testid="profile-share-bands">
      <svg
        viewBox={`0 0 ${s.frame.width} ${s.frame.height}`}
        width="100%"
        role="img"
        aria-label={title}
        className="max-w-[520px]"
      >
        <title>{title}</title>
        <ChartAxes frame={s.frame} />
        {s.families.map((f) =>
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
        {s.families.map((f) =>
          f.medianPaths.map((d) => (
            <path key={`${f.family}-${d}`} d={d} fill="none" stroke={f.stroke} strokeWidth={1.4} />
          )),
        )}
      </svg>
      <figcaption className="mt-1 flex flex-wrap gap-x-3 text-[11px] text-stone-700">
        {s.families.map((f) => (
          <span key={f.family} className="flex items-center gap-1">
            <span
              className="inline-block h-2.5 w-4 rounded-sm"
              style={{ background: f.fill, border: `1px solid ${f.stroke}` }}
            />
            {f.family}
          </span>
        ))}
      </figcaption>
    </figure>
  );
}
