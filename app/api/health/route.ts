import { health } from "@/lib/runtime/health";

export const dynamic = "force-dynamic";

export function GET() {
  return Response.json(health());
}
