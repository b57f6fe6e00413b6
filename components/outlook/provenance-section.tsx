import { getFormatter } from 'next-intl/server';
import type { OutlookView } from '@/lib/data/outlooks';
import type { OutlookViewModel } from '@/lib/outlook/view-model';
import { getMsgText } from './msg-text';

/** Which engine, input and profile version made the outlook, when and by whom, and its sources. */
export async function ProvenanceSection({ vm, outlook }: { vm: OutlookViewModel; outlook: Pick<OutlookView, 'computedAt' | 'computedBy' | 'profileVersion'> }) {
  const text = await getMsgText();
  const format = await getFormatter();
  const when = format.dateTime(new Date(outlook.computedAt), { dateStyle: 'medium', timeStyle: 'short', timeZone: 'UTC' });
  const k = (key: string, values?: Record<string, string | number>) => text({ key: `outlook.provenance.${key}`, values });
  return (
    <footer aria-labelledby="provenance" className="border-t border-snow-300 pt-4 text-sm">
      <h2 id="provenance" className="font-bold">{k('title')}</h2>
      <dl className="mt-2 grid gap-x-6 gap-y-1 sm:grid-cols-[14rem_1fr]">
        <dt className="text-ink-soft">{k('engine')}</dt>
        <dd>{vm.provenance.engineVersion}</dd>
        <dt className="text-ink-soft">{k('input')}</dt>
        <dd className="break-all font-mono text-xs leading-5">{vm.provenance.inputSha256}</dd>
        <dt className="text-ink-soft">{k('profileVersion')}</dt>
        <dd>{outlook.profileVersion}</dd>
        <dt className="text-ink-soft">{k('computed')}</dt>
        <dd>{outlook.computedBy ? k('computedBy', { when, who: outlook.computedBy }) : k('computedWhen', { when })}</dd>
      </dl>
      <h3 className="mt-3 font-bold">{k('sources')}</h3>
      <ol className="mt-1 list-decimal space-y-0.5 pl-5 text-xs text-ink-soft">
        {vm.provenance.sources.map((s) => <li key={s}>{s}</li>)}
      </ol>
    </footer>
  );
}
