'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { runOutlookAction } from '@/lib/actions/outlooks';

/** "Run the outlook" / "Run again" for planners and admins; refreshes the page when the run ends. */
export function RunOutlookButton({ communitySlug, profileSlug, again, help }: { communitySlug: string; profileSlug: string; again: boolean; help: string }) {
  const t = useTranslations('outlook.run');
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [status, setStatus] = useState<{ kind: 'ok' | 'error'; text: string } | null>(null);

  const run = () => {
    setStatus(null);
    startTransition(async () => {
      try {
        const r = await runOutlookAction({ communitySlug, profileSlug });
        if (r.ok) {
          setStatus({ kind: 'ok', text: r.data?.reused ? t('reused') : t('done') });
          router.refresh();
        } else {
          setStatus({ kind: 'error', text: t('failed', { message: r.message }) });
        }
      } catch (e) {
        setStatus({ kind: 'error', text: t('failed', { message: e instanceof Error ? e.message : '' }) });
      }
    });
  };

  return (
    <div className="flex flex-wrap items-center gap-3">
      <button
        type="button"
        onClick={run}
        disabled={pending}
        aria-describedby="run-outlook-help"
        className="rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong disabled:cursor-wait disabled:opacity-70"
      >
        {again ? t('again') : t('button')}
      </button>
      <p id="run-outlook-help" className="text-sm text-ink-soft">{help}</p>
      <p role="status" aria-live="polite" className={`w-full text-sm ${status?.kind === 'error' ? 'text-rust' : ''}`}>
        {pending ? t('running') : status?.text ?? ''}
      </p>
    </div>
  );
}
