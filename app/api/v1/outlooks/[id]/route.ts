import { z } from 'zod';
import { getOutlookForMember } from '@/lib/data/outlooks';
import { idParam, outlookDto } from '@/lib/schemas/api/dto';
import { apiRoute, json } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

export const GET = apiRoute(z.object({ id: idParam }), async (_req, { id }) => json(outlookDto, await getOutlookForMember(id)));
