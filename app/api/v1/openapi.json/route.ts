import { openApiDocument } from '@/lib/schemas/api/openapi';

export const dynamic = 'force-static';

/** The v1 API described as OpenAPI 3.1, generated from the same zod schemas the routes use. */
export function GET() {
  return Response.json(openApiDocument(), { headers: { 'cache-control': 'public, max-age=300' } });
}
