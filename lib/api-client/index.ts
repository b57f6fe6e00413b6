/**
 * The client's one door to the v1 API: typed fetchers (each answer checked against the same zod DTO
 * schema the server answers with) and the react-query keys, so that every component asks for the
 * same thing under the same key and invalidates it in one place. Client-safe.
 */
import type { z } from 'zod';
import { communityDto, communityListDto, errorDto, jobDto, outlookDto, outlookRequestDto, profileDto, type OutlookRequestBody } from '@/lib/schemas/api/dto';

export const queryKeys = {
  communities: () => ['communities'] as const,
  community: (slug: string) => ['communities', slug] as const,
  profile: (id: string) => ['profiles', id] as const,
  job: (id: string) => ['jobs', id] as const,
  outlook: (id: string) => ['outlooks', id] as const,
};

/** A v1 API error answer (or a network failure: status 0). */
export class ApiClientError extends Error {
  constructor(
    readonly status: number,
    readonly code: string,
    message: string,
    readonly fields?: Record<string, string[]>,
  ) {
    super(message);
    this.name = 'ApiClientError';
  }
}

async function call<S extends z.ZodType>(path: string, schema: S, init?: RequestInit): Promise<z.output<S>> {
  let res: Response;
  try {
    res = await fetch(path, { credentials: 'same-origin', ...init, headers: { accept: 'application/json', ...(init?.headers ?? {}) } });
  } catch {
    throw new ApiClientError(0, 'network', 'The server could not be reached.');
  }
  const body: unknown = await res.json().catch(() => null);
  if (!res.ok) {
    const e = errorDto.safeParse(body);
    throw e.success ? new ApiClientError(res.status, e.data.error.code, e.data.error.message, e.data.error.fields) : new ApiClientError(res.status, 'http', `HTTP ${res.status}`);
  }
  return schema.parse(body);
}

export const api = {
  communities: () => call('/api/v1/communities', communityListDto),
  community: (slug: string) => call(`/api/v1/communities/${encodeURIComponent(slug)}`, communityDto),
  profile: (id: string) => call(`/api/v1/profiles/${encodeURIComponent(id)}`, profileDto),
  job: (id: string) => call(`/api/v1/jobs/${encodeURIComponent(id)}`, jobDto),
  outlook: (id: string) => call(`/api/v1/outlooks/${encodeURIComponent(id)}`, outlookDto),
  requestOutlook: (profileId: string, body: OutlookRequestBody) =>
    call(`/api/v1/profiles/${encodeURIComponent(profileId)}/outlooks`, outlookRequestDto, { method: 'POST', headers: { 'content-type': 'application/json' }, body: JSON.stringify(body) }),
};

/** A job has ended (nothing more to poll). */
export const jobEnded = (state: string) => state === 'succeeded' || state === 'failed' || state === 'cancelled';
