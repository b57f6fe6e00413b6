import { z } from 'zod';
import { getCommunityForMember } from '@/lib/data/api-communities';
import { communityDto, slugParam } from '@/lib/schemas/api/dto';
import { apiRoute, json } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(z.object({ slug: slugParam }), async (_req, { slug }) => json(communityDto, await getCommunityForMember(slug)));
