/**
 * The OpenAPI document of the v1 API lists exactly the routes that exist under app/api/v1, with the
 * methods each route file exports; it is generated (zod-openapi) from the DTO schemas and is valid
 * OpenAPI 3.1 in its outline. The horizons the API accepts are the engine's.
 */
import { readdirSync, readFileSync, statSync } from 'node:fs';
import path from 'node:path';
import { describe, expect, it } from 'vitest';
import { HORIZONS } from '@/lib/engine';
import { API_HORIZONS } from '@/lib/schemas/api/dto';
import { openApiDocument } from '@/lib/schemas/api/openapi';

const V1 = path.join(process.cwd(), 'app/api/v1');

function routes(dir = V1): string[] {
  return readdirSync(dir).flatMap((name) => {
    const full = path.join(dir, name);
    if (statSync(full).isDirectory()) return routes(full);
    if (name !== 'route.ts') return [];
    const url = '/' + path.relative(V1, dir).split(path.sep).map((s) => s.replace(/^\[(.+)\]$/, '{$1}')).join('/');
    const source = readFileSync(full, 'utf8');
    const methods = [...source.matchAll(/export\s+(?:const|async function|function)\s+(GET|POST|PUT|PATCH|DELETE)\b/g)].map((m) => m[1]!.toLowerCase());
    return methods.map((m) => `${m} ${url}`);
  });
}

describe('OpenAPI document of the v1 API', () => {
  const doc = openApiDocument();

  it('is OpenAPI 3.1 with components generated from the schemas', () => {
    expect(doc.openapi).toBe('3.1.0');
    expect(Object.keys(doc.components?.schemas ?? {})).toEqual(expect.arrayContaining(['Job', 'Community', 'GroundProfile', 'Outlook', 'OutlookRequest', 'Error']));
  });

  it('lists every route that exists, and no route that does not', () => {
    const inTree = routes().sort();
    const inDoc = Object.entries(doc.paths ?? {})
      .flatMap(([p, item]) => Object.keys(item ?? {}).filter((k) => ['get', 'post', 'put', 'patch', 'delete'].includes(k)).map((m) => `${m} ${p}`))
      .sort();
    expect(inTree.length).toBeGreaterThan(5);
    expect(inDoc).toEqual(inTree);
  });

  it('describes the error answers of the outlook request', () => {
    const post = doc.paths?.['/profiles/{id}/outlooks']?.post;
    expect(Object.keys(post?.responses ?? {}).sort()).toEqual(['200', '202', '400', '401', '403', '404', '413', '415', '422']);
  });

  it('accepts the engine’s horizons', () => {
    expect([...API_HORIZONS]).toEqual([...HORIZONS]);
  });
});
