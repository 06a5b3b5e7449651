import { health } from "@/lib/engine/health";

export const dynamic = "force-dynamic";

export function GET() {
  return Response.json(health());
}
