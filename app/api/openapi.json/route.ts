import { openApiDocument } from "@/lib/service/openapi";

export function GET() {
  return Response.json(openApiDocument);
}
