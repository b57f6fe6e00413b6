import type { OutlookViewModel, RatingCell } from '@/lib/outlook/view-model';
import { HazardMark } from './hazard-mark';
import { getMsgText } from './msg-text';
import { ScenarioLine } from './scenario-line';
import { ScrollRegion } from './scroll-region';

/** The concern rating of every scenario × horizon, by shape and word. */
export async function RatingSection({ vm }: { vm: OutlookViewModel }) {
  const text = await getMsgText();
  const mark = (c: RatingCell) => <HazardMark level={c.level} word={text(c.word)} detail={text({ key: 'outlook.rating.inThisScreening' })} />;
  const title = text({ key: 'outlook.rating.title' });
  return (
    <section aria-labelledby="rating">
      <h2 id="rating" className="text-lg font-bold">{title}</h2>
      <p className="mt-1 max-w-3xl text-sm text-ink-soft">{text({ key: 'outlook.rating.intro' })}</p>
      <p className="mt-1 text-sm text-ink-soft">{text({ key: 'outlook.rating.legend' })}</p>
      <ScrollRegion label={title} minWidth="md">
        <table className="w-full min-w-[640px] text-sm">
          <thead className="border-b border-snow-300 text-left text-ink-soft">
            <tr>
              <th scope="col" className="py-1 font-normal">{text({ key: 'outlook.rating.scenarioColumn' })}</th>
              <th scope="col" className="font-normal">{text(vm.baseline.reference)}</th>
              {vm.horizons.map((h) => <th key={h.horizon} scope="col" className="font-normal">{text(h.label)}</th>)}
            </tr>
          </thead>
          <tbody>
            {vm.ratings.rows.map((row) => {
              const s = vm.scenarios.find((x) => x.id === row.scenario)!;
              return (
                <tr key={row.scenario} className="border-b border-snow-200 align-top">
                  <th scope="row" className="py-2 pr-3 text-left font-normal">
                    <span className="inline-flex items-center gap-2"><ScenarioLine scenario={row.scenario} width={28} />{text(s.title)}</span>
                  </th>
                  <td className="py-2 pr-3">{mark(vm.ratings.baseline)}</td>
                  {row.cells.map((c, i) => <td key={vm.horizons[i]!.horizon} className="py-2 pr-3">{c ? mark(c) : '—'}</td>)}
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollRegion>
    </section>
  );
}
