import { BASELINE_STYLE, SCENARIO_STYLES, type OutlookScenario } from '@/lib/outlook/scenarios';

/** A short sample of a scenario's line (colour and dash pattern), for legends and table rows. */
export function ScenarioLine({ scenario, width = 36 }: { scenario: OutlookScenario | 'baseline'; width?: number }) {
  const s = scenario === 'baseline' ? BASELINE_STYLE : SCENARIO_STYLES[scenario];
  return (
    <svg width={width} height="10" viewBox={`0 0 ${width} 10`} aria-hidden="true" focusable="false" className="inline-block shrink-0">
      <line x1="1" y1="5" x2={width - 1} y2="5" stroke={s.colour} strokeWidth={s.width + 0.5} strokeDasharray={s.dash || undefined} strokeLinecap="butt" />
    </svg>
  );
}

/** The scenarios in their fixed order, each with its line and name. */
export function ScenarioLegend({ scenarios, names, title, baseline }: { scenarios: OutlookScenario[]; names: Record<string, string>; title: string; baseline?: string }) {
  return (
    <div className="text-xs">
      <p className="sr-only">{title}</p>
      <ul className="flex flex-wrap gap-x-4 gap-y-1">
        {scenarios.map((s) => (
          <li key={s} className="inline-flex items-center gap-1.5">
            <ScenarioLine scenario={s} />
            <span>{names[s]}</span>
          </li>
        ))}
        {baseline ? (
          <li className="inline-flex items-center gap-1.5">
            <ScenarioLine scenario="baseline" />
            <span>{baseline}</span>
          </li>
        ) : null}
      </ul>
    </div>
  );
}
