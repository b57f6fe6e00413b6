'use client';

import { useState } from 'react';
import { CartesianGrid, Line, LineChart, ReferenceLine, ResponsiveContainer, Tooltip, XAxis, YAxis } from 'recharts';
import { useLocale } from 'next-intl';
import type { EnvelopeSeries } from '@/lib/outlook/chart-data';
import { formatNumber, formatTemperature } from '@/lib/outlook/rounding';
import { BASELINE_STYLE, SCENARIO_STYLES } from '@/lib/outlook/scenarios';
import { ScenarioLegend } from './scenario-line';

export interface GroundTemperatureChartLabels {
  legend: string;
  depthAxis: string;
  tempAxis: string;
  zero: string;
  coldest: string;
  warmest: string;
  horizonPicker: string;
  horizons: Record<number, string>;
  baseline: string;
}

/**
 * Ground temperature against depth, depth increasing DOWNWARD: the coldest and warmest temperature
 * of the window at each depth (the "trumpet"), one pair of lines a scenario with its colour and dash,
 * the baseline in grey, 0 °C marked. A horizon picker chooses the window.
 */
export function GroundTemperatureChart({ data, names, labels }: { data: EnvelopeSeries; names: Record<string, string>; labels: GroundTemperatureChartLabels }) {
  const locale = useLocale();
  const [horizon, setHorizon] = useState<number>(data.horizons.includes(2050) ? 2050 : data.horizons[0]!);
  const rows = data.byHorizon[horizon] ?? [];
  const groupName = 'ground-temperature-horizon';
  const seriesName = (key: string) => {
    const [s, side] = key.split(':');
    const who = s === 'base' ? labels.baseline : names[s!] ?? s!;
    return `${who}, ${side === 'min' ? labels.coldest : labels.warmest}`;
  };
  return (
    <div>
      <fieldset className="mb-2 flex flex-wrap items-center gap-3 text-sm">
        <legend className="sr-only">{labels.horizonPicker}</legend>
        <span aria-hidden="true" className="text-ink-soft">{labels.horizonPicker}:</span>
        {data.horizons.map((h) => (
          <label key={h} className={`cursor-pointer rounded border px-2 py-0.5 ${h === horizon ? 'border-frost bg-frost-pale font-bold' : 'border-snow-300 bg-ice-raised'}`}>
            <input type="radio" name={groupName} value={h} checked={h === horizon} onChange={() => setHorizon(h)} className="sr-only" />
            {labels.horizons[h]}
          </label>
        ))}
      </fieldset>
      <ScenarioLegend scenarios={data.scenarios} names={names} title={labels.legend} baseline={labels.baseline} />
      <div className="mt-2 h-96 w-full">
        <ResponsiveContainer width="100%" height="100%">
          <LineChart data={rows} layout="vertical" margin={{ top: 8, right: 16, bottom: 28, left: 8 }}>
            <CartesianGrid stroke="#dde4e8" />
            <XAxis
              type="number"
              domain={['auto', 'auto']}
              tick={{ fontSize: 11 }}
              tickFormatter={(v: number) => formatNumber(v, 0, locale)}
              label={{ value: labels.tempAxis, position: 'insideBottom', offset: -16, fontSize: 11 }}
            />
            <YAxis
              dataKey="depth"
              type="number"
              // In recharts' vertical layout a number Y axis already runs from the top down: depth
              // increases downward without \`reversed\` (which would put the surface at the bottom).
              domain={[0, data.maxDepthM]}
              ticks={Array.from({ length: Math.floor(data.maxDepthM / 2.5) + 1 }, (_, i) => i * 2.5)}
              tick={{ fontSize: 11 }}
              tickFormatter={(v: number) => formatNumber(v, Number.isInteger(v) ? 0 : 1, locale)}
              label={{ value: labels.depthAxis, angle: -90, position: 'insideLeft', offset: 10, fontSize: 11, style: { textAnchor: 'middle' } }}
              width={56}
            />
            <ReferenceLine x={0} stroke="#9a5a14" strokeWidth={1.5} label={{ value: labels.zero, position: 'insideTopRight', fontSize: 11, fill: '#9a5a14' }} />
            <Tooltip
              formatter={(value, name) => [`${formatTemperature(Number(value), locale)} °C`, seriesName(String(name))]}
              labelFormatter={(depth) => `${formatNumber(Number(depth), Number(depth) < 1 ? 2 : 1, locale)} m`}
            />
            {['min', 'max'].map((side) => (
              <Line key={`base:${side}`} dataKey={`base:${side}`} name={`base:${side}`} type="linear" dot={false} isAnimationActive={false} stroke={BASELINE_STYLE.colour} strokeWidth={BASELINE_STYLE.width} strokeDasharray={BASELINE_STYLE.dash} />
            ))}
            {data.scenarios.flatMap((s) =>
              ['min', 'max'].map((side) => (
                <Line key={`${s}:${side}`} dataKey={`${s}:${side}`} name={`${s}:${side}`} type="linear" dot={false} isAnimationActive={false} stroke={SCENARIO_STYLES[s].colour} strokeWidth={SCENARIO_STYLES[s].width - 0.5} strokeDasharray={SCENARIO_STYLES[s].dash || undefined} />
              )),
            )}
          </LineChart>
        </ResponsiveContainer>
      </div>
    </div>
  );
}
