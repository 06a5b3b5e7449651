/** Family shares of the Ox loss as bars (central) with 5–95 % whiskers and the median tick: the budget chart's bands. */
import type { ShareBand } from "@/lib/uncertainty/bandSeries";

const W = 160;

export function ShareRangeBars({ bands }: { bands: ShareBand[] }) {
  const row = 16;
  return (
    <svg
      data-testid="share-range-bars"
      width={W + 70}
      height={bands.length * row + 4}
      role="img"
      aria-label="Family shares with 5–95 % ranges"
    >
      {bands.map((b, i) => {
        const y = i * row + 2;
        const x = (v: number | null) => 60 + (v ?? 0) * W;
        return (
          <g key={b.family}>
            <text x={56} y={y + 11} textAnchor="end" fontSize={10} fill="#44403c">
              {b.family}
            </text>
            <rect x={60} y={y + 3} width={(b.central ?? 0) * W} height={row - 6} fill="#d6d3d1" />
            {b.p05 !== null && b.p95 !== null && (
              <line x1={x(b.p05)} x2={x(b.p95)} y1={y + row / 2} y2={y + row / 2} stroke="#1c1917" strokeWidth={1.5} />
            )}
            {b.median !== null && (
              <line x1={x(b.median)} x2={x(b.median)} y1={y + 2} y2={y + row - 2} stroke="#1c1917" />
            )}
          </g>
        );
      })}
    </svg>
  );
}
