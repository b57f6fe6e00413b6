import type { OutlookViewModel } from '@/lib/outlook/view-model';
import { getMsgText } from './msg-text';

/** The plain-language paragraph about one scenario. */
export async function SummarySection({ vm }: { vm: OutlookViewModel }) {
  if (!vm.summary) return null;
  const text = await getMsgText();
  return (
    <section aria-labelledby="summary" className="max-w-3xl">
      <h2 id="summary" className="text-lg font-bold">{text({ key: 'outlook.summaryTitle' })}</h2>
      <p className="mt-2 leading-relaxed">{vm.summary.sentences.map(text).join(' ')}</p>
      <p className="mt-2 text-sm text-ink-soft">{text(vm.summary.note)}</p>
    </section>
  );
}
