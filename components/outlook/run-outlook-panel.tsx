'use client';

import { useEffect, useState } from 'react';
import { useRouter, usePathname } from 'next/navigation';
import { useForm } from 'react-hook-form';
import { zodResolver } from '@hookform/resolvers/zod';
import { z } from 'zod';
import { useFormatter, useTranslations } from 'next-intl';
import { useQuery } from '@tanstack/react-query';
import { api, jobEnded, queryKeys } from '@/lib/api-client';
import { runOutlookAction } from '@/lib/actions/outlooks';
import { API_HORIZONS, type JobDto } from '@/lib/schemas/api/dto';
import { OUTLOOK_HORIZONS, OUTLOOK_SCENARIOS, SCENARIO_STYLES } from '@/lib/outlook/scenarios';

const formSchema = z.object({
  scenarios: z.array(z.enum(OUTLOOK_SCENARIOS)).min(1),
  horizons: z.array(z.string()).min(1),
});
type FormValues = z.infer<typeof formSchema>;

/** Stage codes the worker reports (lib/jobs/kinds/outlook.ts) that have words of their own. */
const STAGES = new Set(['starting', 'history', 'scenarios', 'summary', 'storing']);

/**
 * "Run the outlook" for planners and admins: choose horizons and scenarios, queue the job, follow it
 * (queued → running with its stage and percent → done) by polling the v1 API through react-query,
 * then show the new outlook without a full reload (the page reads `?outlook=<id>`).
 */
export function RunOutlookPanel({ communitySlug, profileSlug, again, version }: { communitySlug: string; profileSlug: string; again: boolean; version: number }) {
  const t = useTranslations('outlook');
  const format = useFormatter();
  const router = useRouter();
  const pathname = usePathname();
  const [job, setJob] = useState<JobDto | null>(null);
  const [refused, setRefused] = useState<string | null>(null);
  const { register, handleSubmit, formState } = useForm<FormValues>({
    resolver: zodResolver(formSchema),
    defaultValues: { scenarios: [...OUTLOOK_SCENARIOS], horizons: OUTLOOK_HORIZONS.map(String) },
  });

  const followed = useQuery({
    queryKey: queryKeys.job(job?.id ?? 'none'),
    queryFn: () => api.job(job!.id),
    enabled: !!job && !jobEnded(job.state),
    initialData: job ?? undefined,
    refetchInterval: (q) => (q.state.data && jobEnded(q.state.data.state) ? false : 1000),
  });
  const current = job ? (followed.data ?? job) : null;
  const outlookId = current?.state === 'succeeded' ? (current.result?.outlookId as string | undefined) : undefined;
  // The server renders the stored outlook once the page's address names it.
  useEffect(() => {
    if (outlookId) router.replace(`${pathname}?outlook=${encodeURIComponent(outlookId)}`, { scroll: false });
  }, [outlookId, pathname, router]);

  const submit = handleSubmit(async (values) => {
    setRefused(null);
    const r = await runOutlookAction({ communitySlug, profileSlug, scenarios: values.scenarios, horizons: values.horizons.map(Number) }).catch(() => null);
    if (!r) setRefused(t('run.unreachable'));
    else if (r.ok) setJob(r.data!.job);
    else setRefused(t('run.failed', { message: r.message }));
  });

  const busy = formState.isSubmitting || (!!current && !jobEnded(current.state));
  const percent = current ? format.number(current.progress, { style: 'percent', maximumFractionDigits: 0 }) : '';
  const stage = current?.stage && STAGES.has(current.stage) ? t(`job.stage.${current.stage}` as 'job.stage.history') : '';

  return (
    <form onSubmit={submit} className="space-y-3" aria-describedby="run-outlook-help" noValidate>
      <p id="run-outlook-help" className="text-sm text-ink-soft">{t('run.helpChoice', { version })}</p>
      <div className="flex flex-wrap gap-6">
        <fieldset>
          <legend className="text-sm font-bold">{t('run.horizons')}</legend>
          <div className="mt-1 flex flex-wrap gap-x-3 gap-y-1">
            {API_HORIZONS.map((h) => (
              <label key={h} className="inline-flex items-center gap-1 text-sm">
                <input type="checkbox" value={String(h)} {...register('horizons')} /> {t('horizon', { horizon: h })}
              </label>
            ))}
          </div>
          {formState.errors.horizons ? <p className="mt-1 text-sm text-rust">{t('run.chooseHorizon')}</p> : null}
        </fieldset>
        <fieldset>
          <legend className="text-sm font-bold">{t('run.scenarios')}</legend>
          <div className="mt-1 flex flex-wrap gap-x-3 gap-y-1">
            {OUTLOOK_SCENARIOS.map((s) => (
              <label key={s} className="inline-flex items-center gap-1 text-sm">
                <input type="checkbox" value={s} {...register('scenarios')} /> {t(`scenario.${SCENARIO_STYLES[s].key}`)}
              </label>
            ))}
          </div>
          {formState.errors.scenarios ? <p className="mt-1 text-sm text-rust">{t('run.chooseScenario')}</p> : null}
        </fieldset>
      </div>
      <button type="submit" disabled={busy} className="rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong disabled:cursor-wait disabled:opacity-70">
        {again ? t('run.again') : t('run.button')}
      </button>
      <div role="status" aria-live="polite" className="text-sm">
        {refused ? <p className="text-rust">{refused}</p> : null}
        {current?.state === 'queued' ? <p>{t('job.queued')}</p> : null}
        {current?.state === 'running' ? (
          <div className="space-y-1">
            <p>{t('job.running', { stage, percent })}</p>
            <progress className="h-2 w-full max-w-md" max={1} value={current.progress} aria-label={t('job.progressLabel')} />
          </div>
        ) : null}
        {current?.state === 'succeeded' ? <p>{current.result?.reused ? t('run.reused') : t('run.done')}</p> : null}
        {current?.state === 'failed' ? <p className="text-rust">{t('job.failed', { message: current.error ?? '' })}</p> : null}
        {current?.state === 'cancelled' ? <p className="text-rust">{t('job.cancelled')}</p> : null}
        {followed.isError ? <p className="text-rust">{t('run.unreachable')}</p> : null}
      </div>
    </form>
  );
}
