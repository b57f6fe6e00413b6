'use client';

import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useLocale } from 'next-intl';
import type { AirSeries } from '@/lib/outlook/chart-data';
import { formatNumber, formatTemperature } from '@/lib/outlook/rounding';
import { BASELINE_STYLE, SCENARIO_STYLES } from '@/lib/outlook/scenarios';
import { ScenarioLegend } from './scenario-line';

export interface AirTemperatureChartLabels {
  legend: string;
  airAxis: string;
  /** Category labels: 'baseline' and each horizon. */
  categories: Record<string, string>;
  baseline: string;
}

/** Mean annual air temperature by horizon, one line a scenario, starting from the baseline. */
export function AirTemperatureChart({ data, names, labels }: { data: AirSeries; names: Record<string, string>; labels: AirTemperatureChartLabels }) {
  const locale = useLocale();
  return (
    <div>
      <ScenarioLegend scenarios={data.scenarios} names={names} title={labels.legend} baseline={labels.baseline} />
      <div className="mt-2 h-72 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={data.rows} margin={{ top: 8, right: 16, bottom: 8, left: 8 }}>
            <CartesianGrid stroke="#dde4e8" vertical={false} />
            <XAxis dataKey="key" type="category" tick={{ fontSize: 11 }} tickFormatter={(k: string) => labels.categories[k] ?? k} padding={{ left: 16, right: 16 }} />
            <YAxis
              type="number"
              domain={['auto', 'auto']}
              tick={{ fontSize: 11 }}
              tickFormatter={(v: number) => formatNumber(v, 0, locale)}
              label={{ value: labels.airAxis, angle: -90, position: 'insideLeft', offset: 10, fontSize: 11, style: { textAnchor: 'middle' } }}
              width={56}
            />
            <ReferenceLine y={data.baselineC} stroke={BASELINE_STYLE.colour} strokeDasharray={BASELINE_STYLE.dash} strokeWidth={BASELINE_STYLE.width} />
            <Tooltip
              formatter={(value, name) => [`${formatTemperature(Number(value), locale)} °C`, names[String(name)] ?? String(name)]}
              labelFormatter={(k) => labels.categories[String(k)] ?? String(k)}
            />
            {data.scenarios.map((s) => (
              <Line key={s} dataKey={s} name={s} type="linear" isAnimationActive={false} stroke={SCENARIO_STYLES[s].colour} strokeWidth={SCENARIO_STYLES[s].width} strokeDasharray={SCENARIO_STYLES[s].dash || undefined} dot={{ r: 3, fill: SCENARIO_STYLES[s].colour, strokeWidth: 0 }} />
            ))}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </div>
  );
}
