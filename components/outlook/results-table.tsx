import type { OutlookViewModel, TableRow } from '@/lib/outlook/view-model';
import { HazardShape } from './hazard-mark';
import { getMsgText } from './msg-text';
import { ScenarioLine } from './scenario-line';
import { ScrollRegion } from './scroll-region';

const CELL = 'px-2 py-1';
const HEAD = 'px-2 py-1 font-normal leading-tight';

/** The results table: every window's means, rounded and formatted in the reader's locale. */
export async function ResultsTable({ vm }: { vm: OutlookViewModel }) {
  const text = await getMsgText();
  const title = text({ key: 'outlook.tableTitle' });
  const cells = (r: TableRow) => (
    <>
      <td className={CELL}>{r.air}</td>
      <td className={CELL}>{r.thawingIndex}</td>
      <td className={CELL}>{r.freezingIndex}</td>
      <td className={CELL}>{r.thaw}</td>
      <td className={CELL}>{text(r.permafrostTable)}</td>
      <td className={CELL}>{r.ground}</td>
      <td className={CELL}>{text(r.talik)}</td>
      <td className={CELL}>{text(r.settlement)}</td>
      <td className={`${CELL} pl-4 text-left`}>
        <span className="inline-flex items-center gap-1.5 whitespace-nowrap"><HazardShape level={r.rating.level} size={12} />{text(r.rating.word)}</span>
      </td>
    </>
  );
  const [base, ...rows] = vm.table.rows;
  return (
    <section aria-labelledby="table">
      <h2 id="table" className="text-lg font-bold">{title}</h2>
      <p className="mt-1 text-sm text-ink-soft">{text(vm.table.note)}</p>
      <ScrollRegion label={title} minWidth="lg">
        <table className="w-full min-w-[960px] text-right text-sm">
          <thead className="border-b border-snow-300 align-bottom text-ink-soft">
            <tr>
              <th scope="col" className={`${HEAD} pl-0 text-left`}>{text({ key: 'outlook.col.scenario' })}</th>
              <th scope="col" className={`${HEAD} text-left`}>{text({ key: 'outlook.col.window' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.air' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.thawingIndex' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.freezingIndex' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.thaw' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.table' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.ground', values: { depth: vm.table.groundDepth } })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.talik' })}</th>
              <th scope="col" className={HEAD}>{text({ key: 'outlook.col.settlement' })}</th>
              <th scope="col" className={`${HEAD} pl-4 text-left`}>{text({ key: 'outlook.col.rating' })}</th>
            </tr>
          </thead>
          <tbody>
            {base ? (
              <tr className="border-b-2 border-snow-300 bg-snow-100">
                <th scope="row" className="py-1 text-left font-normal"><span className="inline-flex items-center gap-2"><ScenarioLine scenario="baseline" width={24} />{text(vm.baseline.reference)}</span></th>
                <td className={`${CELL} text-left`}>{text(base.window)}</td>
                {cells(base)}
              </tr>
            ) : null}
            {rows.map((r, i) => {
              const first = i === 0 || rows[i - 1]!.scenario !== r.scenario;
              const last = i === rows.length - 1 || rows[i + 1]!.scenario !== r.scenario;
              const span = rows.filter((x) => x.scenario === r.scenario).length;
              const s = vm.scenarios.find((x) => x.id === r.scenario);
              return (
                <tr key={`${r.scenario}-${r.horizon}`} className={`border-b ${last ? 'border-snow-300' : 'border-snow-200'}`}>
                  {first && s ? (
                    <th scope="rowgroup" rowSpan={span} className="py-1 pr-2 text-left align-top font-normal">
                      <span className="inline-flex items-center gap-2"><ScenarioLine scenario={s.id} width={24} />{text(s.title)}</span>
                    </th>
                  ) : null}
                  <td className={`${CELL} whitespace-nowrap text-left`}>{text(r.window)}</td>
                  {cells(r)}
                </tr>
              );
            })}
          </tbody>
        </table>
      </ScrollRegion>
    </section>
  );
}
