/** A small assessment request (2 variants, one question on the oxygen-chlorine set) for route tests. */
export const smallAssessment = (title: string, seed: number) => ({
  title,
  mechanismId: "oxygen-chlorine",
  variants: 2,
  seed,
  base: { altitude_km: 35, latitude_deg: 45, date: "2026-03-20", localSolarTime_h: 12 },
  ranges: { altitude_km: { min: 30, max: 40 } },
  questions: [{ kind: "dominant-family" }],
});
