import { z } from 'zod';
import { requestOutlookForProfile } from '@/lib/data/outlooks';
import { idParam, outlookRequestBody, outlookRequestDto } from '@/lib/schemas/api/dto';
import { apiRoute, json, readJson } from '@/lib/server/api-route';

export const dynamic = 'force-dynamic';

/** Queues an outlook of the profile's current version: 202 with the job, 200 when it has already run. */
export const POST = apiRoute(z.object({ id: idParam }), async (req, { id }) => {
  const body = await readJson(req, outlookRequestBody);
  const job = await requestOutlookForProfile(id, body);
  return json(outlookRequestDto, { job }, job.state === 'succeeded' ? 200 : 202);
});
