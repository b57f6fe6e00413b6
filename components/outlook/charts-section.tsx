import type { OutlookViewModel } from '@/lib/outlook/view-model';
import { AirTemperatureChart } from './air-temperature-chart';
import { GroundTemperatureChart } from './ground-temperature-chart';
import { getMsgText } from './msg-text';
import { ThawDepthChart } from './thaw-depth-chart';

/** The charts: summer thaw by year, ground temperature envelopes, air temperature by window. */
export async function ChartsSection({ vm }: { vm: OutlookViewModel }) {
  const text = await getMsgText();
  const k = (key: string, values?: Record<string, string | number>) => text({ key: `outlook.charts.${key}`, values });
  const baseline = text(vm.baseline.label);
  const names = Object.fromEntries(vm.scenarios.map((s) => [s.id, text(s.name)]));
  // Inside the thaw chart the shaded window already spans its years on the axis: the decade names it.
  const decades = Object.fromEntries(vm.horizons.map((h) => [h.horizon, text({ key: 'outlook.horizon', values: { horizon: h.horizon } })])) as Record<number, string>;
  const windows = Object.fromEntries(vm.horizons.map((h) => [h.horizon, text(h.label)])) as Record<number, string>;
  return (
    <section aria-labelledby="charts" className="space-y-8">
      <h2 id="charts" className="sr-only">{k('thawTitle')}</h2>
      <ChartFigure title={k('thawTitle')} description={k('thawDesc', { baseline })}>
        <ThawDepthChart data={vm.charts.thaw} names={names} labels={{ legend: k('legend'), depthAxis: k('depthAxis'), yearAxis: k('yearAxis'), horizons: decades, baseline, surface: k('surface') }} />
      </ChartFigure>
      <div className="grid gap-6 lg:grid-cols-2">
        <ChartFigure title={k('groundTitle')} description={k('groundDesc')}>
          <GroundTemperatureChart
            data={vm.charts.ground}
            names={names}
            labels={{ legend: k('legend'), depthAxis: k('depthAxis'), tempAxis: k('tempAxis'), zero: k('zero'), coldest: k('coldest'), warmest: k('warmest'), horizonPicker: k('horizonPicker'), horizons: windows, baseline }}
          />
        </ChartFigure>
        <ChartFigure title={k('airTitle')} description={k('airDesc', { baseline })}>
          <AirTemperatureChart data={vm.charts.air} names={names} labels={{ legend: k('legend'), airAxis: k('airAxis'), categories: { baseline, ...Object.fromEntries(vm.horizons.map((h) => [String(h.horizon), decades[h.horizon]!])) }, baseline }} />
        </ChartFigure>
      </div>
    </section>
  );
}

/** One chart in its frame, with its title and what it shows as the figure's caption. */
function ChartFigure({ title, description, children }: { title: string; description: string; children: React.ReactNode }) {
  return (
    <figure className="rounded border border-snow-200 bg-ice-raised p-4">
      <figcaption>
        <h3 className="font-bold">{title}</h3>
        <p className="text-sm text-ink-soft">{description}</p>
      </figcaption>
      <div className="mt-3">{children}</div>
    </figure>
  );
}
