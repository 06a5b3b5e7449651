import { z } from "zod";
import { standardAtmosphere } from "@/lib/atmosphere";
import { parseWith } from "@/lib/engine/requestSchema";
import { respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

const query = z.object({
  altitude_km: z.coerce.number().refine((v) => v >= 0 && v <= 86, "expected an altitude between 0 and 86 km"),
});

export function GET(req: Request) {
  return respond(() => {
    const q = parseWith(query, Object.fromEntries(new URL(req.url).searchParams));
    const a = standardAtmosphere(q.altitude_km);
    return Response.json({ altitude_km: q.altitude_km, T_K: a.T_K, p_hPa: a.p_hPa, M_cm3: a.M_cm3 });
  });
}
