import { getAnalysisRecord } from "@/lib/service/analyses";
import { cyclesCsv, ratesCsv, sensitivitiesCsv, speciesCsv, uncertaintyCsv } from "@/lib/service/csv";
import { csvResponse, notFound, respond } from "@/lib/service/http";

export const dynamic = "force-dynamic";

const EXPORTS = {
  "rates.csv": ratesCsv,
  "species.csv": speciesCsv,
  "cycles.csv": cyclesCsv,
  "uncertainty.csv": uncertaintyCsv,
  "sensitivities.csv": sensitivitiesCsv,
} as const;

export async function GET(_req: Request, ctx: { params: Promise<{ id: string; file: string }> }) {
  const { id, file } = await ctx.params;
  return respond(async () => {
    const make = EXPORTS[file as keyof typeof EXPORTS];
    if (!make) throw notFound("export", file);
    const record = await getAnalysisRecord(id);
    return csvResponse(make(record.result), `analysis-${id}-${file}`);
  });
}
