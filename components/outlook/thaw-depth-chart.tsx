'use client';

import { CartesianGrid, Line, LineChart, ReferenceArea, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useLocale } from 'next-intl';
import type { ThawSeries } from '@/lib/outlook/chart-data';
import { formatDepth } from '@/lib/outlook/rounding';
import { BASELINE_STYLE, SCENARIO_STYLES } from '@/lib/outlook/scenarios';
import { ScenarioLegend } from './scenario-line';

export interface ThawDepthChartLabels {
  legend: string;
  depthAxis: string;
  yearAxis: string;
  /** Per horizon, e.g. { 2050: '2050s' }. */
  horizons: Record<number, string>;
  baseline: string;
  surface: string;
}

/**
 * Summer thaw depth drawn DOWNWARD from the ground surface (the trade's picture): the surface is the
 * top edge, depth increases down. One line a scenario (colour and dash), horizon windows shaded,
 * the baseline period in grey with its mean thaw as a reference line.
 */
export function ThawDepthChart({ data, names, labels }: { data: ThawSeries; names: Record<string, string>; labels: ThawDepthChartLabels }) {
  const locale = useLocale();
  const max = Math.max(data.baseline.thawM, ...data.rows.flatMap((r) => data.scenarios.map((s) => r[s] ?? 0)));
  // Round depth steps (0.5, 1 or 2 m), the chart's bottom one step below the deepest thaw.
  const step = max <= 2 ? 0.5 : max <= 6 ? 1 : 2;
  const bottom = Math.max(step, Math.ceil((max * 1.05) / step) * step);
  const depthTicks = Array.from({ length: Math.round(bottom / step) + 1 }, (_, i) => i * step);
  const years = data.rows.map((r) => r.year!);
  const first = Math.min(...years);
  const last = Math.max(...years);
  const yearTicks = Array.from({ length: Math.floor(last / 10) - Math.ceil(first / 10) + 1 }, (_, i) => (Math.ceil(first / 10) + i) * 10);
  return (
    <div>
      <ScenarioLegend scenarios={data.scenarios} names={names} title={labels.legend} baseline={labels.baseline} />
      <div className="mt-2 h-80 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data.rows} margin={{ top: 22, right: 16, bottom: 24, left: 8 }}>
            <CartesianGrid stroke="#dde4e8" vertical={false} />
            <ReferenceArea x1={data.baseline.start} x2={data.baseline.end} fill="#c3ced5" fillOpacity={0.45} ifOverflow="hidden" label={{ value: labels.baseline, position: 'insideBottom', fontSize: 11, fill: '#3b4a56' }} />
            {data.windows.map((w) => (
              <ReferenceArea key={w.horizon} x1={w.start} x2={w.end} fill="#dbe8f1" fillOpacity={0.7} ifOverflow="hidden" label={{ value: labels.horizons[w.horizon], position: 'insideBottom', fontSize: 11, fill: '#15435f' }} />
            ))}
            <XAxis dataKey="year" type="number" domain={[first, last]} ticks={yearTicks} allowDecimals={false} tick={{ fontSize: 11 }} orientation="top" aria-label={labels.yearAxis} />
            <YAxis
              reversed
              type="number"
              domain={[0, bottom]}
              ticks={depthTicks}
              tick={{ fontSize: 11 }}
              tickFormatter={(v: number) => formatDepth(v, locale)}
              label={{ value: labels.depthAxis, angle: -90, position: 'insideLeft', offset: 10, fontSize: 11, style: { textAnchor: 'middle' } }}
              width={56}
            />
            <ReferenceLine y={0} stroke="#15212c" strokeWidth={2} label={{ value: labels.surface, position: 'insideTopLeft', fontSize: 11, fill: '#15212c' }} />
            <ReferenceLine y={data.baseline.thawM} stroke={BASELINE_STYLE.colour} strokeDasharray={BASELINE_STYLE.dash} strokeWidth={BASELINE_STYLE.width} />
            <Tooltip
              formatter={(value, name) => [`${formatDepth(Number(value), locale)} m`, names[String(name)] ?? String(name)]}
              labelFormatter={(year) => String(year)}
              itemSorter={(item) => data.scenarios.indexOf(item.dataKey as never)}
            />
            {data.scenarios.map((s) => (
              <Line key={s} dataKey={s} name={s} type="monotone" dot={false} isAnimationActive={false} stroke={SCENARIO_STYLES[s].colour} strokeWidth={SCENARIO_STYLES[s].width} strokeDasharray={SCENARIO_STYLES[s].dash || undefined} />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </div>
  );
}
