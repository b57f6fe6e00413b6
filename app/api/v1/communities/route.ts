import { z } from 'zod';
import { listCommunitiesForMember } from '@/lib/data/api-communities';
import { communityListDto } from '@/lib/schemas/api/dto';
import { apiRoute, json } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

/** The organisation's communities with their terrain units and each unit's latest rating. */
export const GET = apiRoute(z.object({}), async () => json(communityListDto, { communities: await listCommunitiesForMember() }));
