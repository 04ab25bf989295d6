import { buildOpenApiDocument } from "@/lib/http/openapi";
import { route } from "@/lib/http/route";

let document: ReturnType<typeof buildOpenApiDocument> | undefined;

/** The OpenAPI 3.1 description of /api/v1, generated from the request schemas. Public: it holds no data. */
export const GET = route(async () => {
  document ??= buildOpenApiDocument();
  return document;
});
