import { z } from 'zod';
import { getProfileForMember } from '@/lib/data/profiles';
import { idParam, profileDto } from '@/lib/schemas/api/dto';
import { apiRoute, json } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(z.object({ id: idParam }), async (_req, { id }) => json(profileDto, await getProfileForMember(id)));
