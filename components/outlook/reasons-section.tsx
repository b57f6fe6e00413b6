import type { OutlookViewModel } from '@/lib/outlook/view-model';
import { HazardShape } from './hazard-mark';
import { getMsgText } from './msg-text';
import { ScenarioLine } from './scenario-line';

/** Why each rating: the engine's reasons, one group a scenario, each horizon with its window years. */
export async function ReasonsSection({ vm }: { vm: OutlookViewModel }) {
  const text = await getMsgText();
  return (
    <section aria-labelledby="reasons">
      <h2 id="reasons" className="text-lg font-bold">{text({ key: 'outlook.reasonsTitle' })}</h2>
      <p className="mt-1 text-sm text-ink-soft">{text({ key: 'outlook.reasonsIntro' })}</p>
      <div className="mt-2 space-y-2">
        {vm.reasons.map((g) => (
          <details key={g.scenario} open={g.open} className="rounded border border-snow-200 bg-ice-raised px-4 py-2">
            <summary className="cursor-pointer">
              <span className="inline-flex items-center gap-2"><ScenarioLine scenario={g.scenario} width={28} /><span className="font-bold">{text(g.title)}</span></span>
            </summary>
            <dl className="mt-2 space-y-2 text-sm">
              {g.items.map((item) => {
                const label = text(item.label);
                return (
                  <div key={label} className="grid gap-1 sm:grid-cols-[11rem_1fr]">
                    <dt className="flex items-start gap-1.5">
                      <span className="font-bold">{label}</span>
                      <HazardShape level={item.rating.level} />
                      <span className="sr-only">{text(item.rating.long)}</span>
                    </dt>
                    <dd>
                      <p className="font-bold">{text(item.rating.long)}</p>
                      <ul className="list-disc pl-5">
                        {item.reasons.map((r, i) => <li key={`${r.key}-${i}`}>{text(r)}</li>)}
                      </ul>
                    </dd>
                  </div>
                );
              })}
            </dl>
          </details>
        ))}
      </div>
    </section>
  );
}
