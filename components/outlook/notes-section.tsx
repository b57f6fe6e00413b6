import type { OutlookViewModel } from '@/lib/outlook/view-model';
import { getMsgText } from './msg-text';

/** What the 1-D model could not include, and how much the inputs were measured. */
export async function NotesSection({ vm }: { vm: OutlookViewModel }) {
  const text = await getMsgText();
  return (
    <div className="grid gap-6 md:grid-cols-2">
      <section aria-labelledby="not-modelled">
        <h2 id="not-modelled" className="text-lg font-bold">{text({ key: 'outlook.notModelledTitle' })}</h2>
        {vm.notModelled.items.length ? (
          <>
            <p className="mt-1 text-sm">{text({ key: 'outlook.notModelledPresent' })}</p>
            <ul className="mt-1 list-disc pl-5 text-sm">
              {vm.notModelled.items.map((i) => <li key={i.key + JSON.stringify(i.values ?? {})}>{text(i)}</li>)}
            </ul>
          </>
        ) : (
          <p className="mt-1 text-sm">{text({ key: 'outlook.notModelledNone' })}</p>
        )}
        <p className="mt-2 text-sm text-ink-soft">{text({ key: 'outlook.notModelledAlways' })}</p>
      </section>
      <section aria-labelledby="confidence">
        <h2 id="confidence" className="text-lg font-bold">{text({ key: 'outlook.confidenceTitle' })}</h2>
        <p className="mt-1 text-sm">{text(vm.confidence.text)}</p>
      </section>
    </div>
  );
}
