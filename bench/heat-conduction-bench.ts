/**
 * A benchmark of the ground solver for `npm run bench:engine`: grid nodes × time steps per wall
 * second on one core, Newton iterations included.
 */
import { buildColumnGrid } from '../lib/engine/grid';
import { HeatConductionColumn, isothermalMaterial } from '../lib/engine/heat-conduction';
import { SECONDS_PER_DAY } from '../lib/engine/constants';

/**
 * Node-steps per second of `HeatConductionColumn` on a realistic freeze–thaw problem: about 120
 * cells to 100 m (peat over ice-rich silt over bedrock), daily steps, a sinusoidal surface
 * temperature (mean −4 °C, amplitude 16 °C, so an active layer forms and refreezes every year),
 * geothermal flux 0.06 W m-2, with reporting depths tracked every step.
 * The machine is shared (2 cores for a whole team): the figure is the best of three timed runs after
 * a warm-up (so the JIT has compiled `step`), which measures the solver rather than interference.
 * @param years Simulated years per timed run (default 10), after three untimed warm-up years.
 * @returns Cells × steps per wall-clock second [s-1], best of three runs.
 */
export function measureNodeStepsPerSecond(years = 10): number {
  const grid = buildColumnGrid([0.3, 9.7, 90], { surfaceSpacingM: 0.02, growthFactor: 1.06, maxSpacingM: 1.5 });
  const materials = [
    isothermalMaterial({ conductivityThawedWmK: 0.5, conductivityFrozenWmK: 1.3, heatCapacityThawedJm3K: 3.3e6, heatCapacityFrozenJm3K: 2.0e6, latentHeatJm3: 2.0e8 }),
    isothermalMaterial({ conductivityThawedWmK: 1.2, conductivityFrozenWmK: 1.9, heatCapacityThawedJm3K: 2.6e6, heatCapacityFrozenJm3K: 1.9e6, latentHeatJm3: 1.3e8 }),
    isothermalMaterial({ conductivityThawedWmK: 2.5, conductivityFrozenWmK: 2.6, heatCapacityThawedJm3K: 2.1e6, heatCapacityFrozenJm3K: 2.0e6, latentHeatJm3: 1.0e7 }),
  ];
  const column = new HeatConductionColumn(grid, materials, { bottomHeatFluxWm2: 0.06 });
  column.setTemperatureProfile((z) => -4 + 0.03 * z);
  column.setReportingDepths([0.5, 1, 2, 5, 10, 15, 20]);
  let day = 0;
  const run = (days: number) => {
    for (let d = 0; d < days; d++, day++) column.step(SECONDS_PER_DAY, -4 + 16 * Math.cos((2 * Math.PI * ((day % 365) - 200)) / 365));
  };
  run(3 * 365);
  const steps = 365 * years;
  let best = 0;
  for (let r = 0; r < 3; r++) {
    const t0 = performance.now();
    run(steps);
    const seconds = (performance.now() - t0) / 1000;
    best = Math.max(best, (grid.cellCount * steps) / seconds);
  }
  return best;
}
