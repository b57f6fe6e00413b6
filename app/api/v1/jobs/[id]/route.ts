import { z } from 'zod';
import { getJobForMember } from '@/lib/data/jobs';
import { idParam, jobDto } from '@/lib/schemas/api/dto';
import { apiRoute, json } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(z.object({ id: idParam }), async (_req, { id }) => json(jobDto, await getJobForMember(id)));
