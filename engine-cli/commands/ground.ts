/**
 * The `ground` command of the engine contract: one soil column under a prescribed ground-surface
 * temperature, the solver alone (no snow, no n-factors, no unfrozen water; phase change at one
 * temperature per layer).
 *
 * Time step (documented choice): at most 1 day, and at most 1/2000 of the run, so short runs (the
 * 20-day Neumann check) get about 2000 steps and runs longer than 2000 days get daily steps. Steps
 * never straddle a reporting time, a year end or (for `daily` surfaces) a day boundary: the step
 * before such an event is shortened to land on it. The surface temperature of a step is taken at
 * its end (consistent with the implicit scheme); a `daily` value holds through its day.
 *
 * Annual entries: extremes and time-means over every solver step of the year. `talik` (the contract's
 * definition): a layer at least 0.2 m thick that stayed thawed through this year and the previous
 * one, with ground below it that stayed frozen (so year 1 never has one, and unfrozen ground below
 * the permafrost base does not count). Added fields: `permafrost_table_m` per year (null if no
 * ground stayed frozen all year), `time_step_days`, `cell_count`.
 */
import { z } from 'zod';
import type { EngineCommand } from './types';
import { buildColumnGrid } from '../../lib/engine/grid';
import { HeatConductionColumn, isothermalMaterial } from '../../lib/engine/heat-conduction';
import { DAYS_PER_YEAR, SECONDS_PER_DAY } from '../../lib/engine/constants';
import { EngineInputError } from '../../lib/engine/validation';

const positive = z.number().positive();

/**
 * Bounds of the `ground` command's inputs: what is physical for earth materials, and what the solver
 * finishes within its time budget (docs/site-schema.md, "Bounds"). A value outside is refused with
 * the field's name, never passed on to the solver.
 * - Conductivity 0.02 … 10 W m-1 K-1: still air is about 0.025, quartz about 7.7, the most
 *   conductive common rock minerals below 10 (Farouki 1981, CRREL Monograph 81-1, tables of
 *   constituent conductivities; from memory).
 * - Volumetric heat capacity 1e4 … 1e7 J m-3 K-1: water is 4.18e6, the largest of any earth material
 *   (common practice); 1e4 leaves room for very dry, loose materials.
 * - Volumetric latent heat 0 … 3.4e8 J m-3: all pore space filled with water gives at most
 *   ρw·Lf = 1000 × 333.7e3 = 3.34e8 J m-3 (common practice).
 * - Layer thickness and column depth at most 1000 m, and at most {@link MAX_CELL_STEPS} cell-steps
 *   a run (the grid has about one cell a metre below 12 m, and one step a day).
 */
export const GROUND_BOUNDS = {
  conductivityWmK: { min: 0.02, max: 10 },
  heatCapacityJm3K: { min: 1e4, max: 1e7 },
  latentHeatJm3: { min: 0, max: 3.4e8 },
  columnDepthM: { max: 1000 },
} as const;
/** Most cell × step products a `ground` run may take (about 10 s on one core of this machine: 1039 cells × 3650 steps took 0.92 s, measured). */
export const MAX_CELL_STEPS = 40_000_000;

const B = GROUND_BOUNDS;
const conductivity = z.number().min(B.conductivityWmK.min).max(B.conductivityWmK.max);
const heatCapacity = z.number().min(B.heatCapacityJm3K.min).max(B.heatCapacityJm3K.max);

const layerSchema = z.object({
  thickness_m: positive.max(B.columnDepthM.max),
  conductivity_thawed_w_mk: conductivity,
  conductivity_frozen_w_mk: conductivity,
  heat_capacity_thawed_j_m3k: heatCapacity,
  heat_capacity_frozen_j_m3k: heatCapacity,
  latent_heat_j_m3: z.number().min(B.latentHeatJm3.min).max(B.latentHeatJm3.max),
  freezing_point_c: z.number().min(-30).max(10).default(0),
});

const profilePointSchema = z.object({ depth_m: z.number().min(0), temperature_c: z.number().min(-80).max(80) });

const initialSchema = z.union([
  z.number().min(-80).max(80),
  z
    .array(profilePointSchema)
    .min(1)
    .superRefine((points, ctx) => {
      for (let i = 1; i < points.length; i++) {
        if (!(points[i].depth_m > points[i - 1].depth_m)) {
          ctx.addIssue({ code: 'custom', path: [i, 'depth_m'], message: `must be > the previous depth (${points[i - 1].depth_m})` });
        }
      }
    }),
]);

const surfaceSchema = z.discriminatedUnion('kind', [
  z.object({ kind: z.literal('constant'), temperature_c: z.number().min(-80).max(80) }),
  z.object({
    kind: z.literal('sinusoid'),
    mean_c: z.number().min(-80).max(80),
    amplitude_c: z.number().min(0).max(80),
    period_days: positive,
    phase_days: z.number().default(0),
  }),
  z.object({ kind: z.literal('daily'), temperature_c: z.array(z.number().min(-80).max(80)).min(1) }),
]);

/** Longest run accepted [d]: 1000 years of 365 days (a bound of this engine). */
const MAX_DURATION_DAYS = 365_000;
/** Most reports accepted (a bound of this engine, to keep the output reasonable). */
const MAX_REPORTS = 100_000;

export const groundInputSchema = z.object({
  layers: z
    .array(layerSchema)
    .min(1)
    .max(200)
    .superRefine((layers, ctx) => {
      const total = layers.reduce((sum, l) => sum + l.thickness_m, 0);
      if (total > B.columnDepthM.max) {
        ctx.addIssue({ code: 'custom', message: `the layers add up to ${total} m; the column may be at most ${B.columnDepthM.max} m deep` });
      }
    }),
  initial_temperature_c: initialSchema,
  surface: surfaceSchema,
  bottom_heat_flux_w_m2: z.number().min(-10).max(10).default(0),
  duration_days: positive.max(MAX_DURATION_DAYS),
  output: z.object({
    every_days: positive,
    depths_m: z.array(z.number().min(0)).max(500),
  }),
});

export type GroundInput = z.infer<typeof groundInputSchema>;

export interface GroundAnnualEntry {
  year: number;
  max_thaw_depth_m: number;
  mean_temperature_c: number[];
  min_temperature_c: number[];
  max_temperature_c: number[];
  talik: boolean;
  /** Depth to the top of ground that stayed frozen all year [m]; null if none did (added field). */
  permafrost_table_m: number | null;
}

export interface GroundOutput {
  times_days: number[];
  thaw_depth_m: number[];
  temperature_c: number[][];
  annual: GroundAnnualEntry[];
  /** Largest solver step used [d] (added field). */
  time_step_days: number;
  /** Number of grid cells (added field). */
  cell_count: number;
}

const round = (v: number, digits = 4) => {
  const f = 10 ** digits;
  const r = Math.round(v * f) / f;
  return r === 0 ? 0 : r; // no −0 in the output
};

/** Initial temperature at a depth from the contract's uniform value or profile [°C]. */
function initialProfile(init: GroundInput['initial_temperature_c']): (z: number) => number {
  if (typeof init === 'number') return () => init;
  return (z) => {
    if (z <= init[0].depth_m) return init[0].temperature_c;
    const last = init[init.length - 1];
    if (z >= last.depth_m) return last.temperature_c;
    let i = 0;
    while (init[i + 1].depth_m < z) i++;
    const a = init[i];
    const b = init[i + 1];
    return a.temperature_c + ((z - a.depth_m) / (b.depth_m - a.depth_m)) * (b.temperature_c - a.temperature_c);
  };
}

/** Surface temperature for the step ending at tEnd [d] that started at tStart [d]. */
function surfaceFunction(surface: GroundInput['surface']): (tStart: number, tEnd: number) => number {
  switch (surface.kind) {
    case 'constant':
      return () => surface.temperature_c;
    case 'sinusoid': {
      const w = (2 * Math.PI) / surface.period_days;
      return (_s, tEnd) => surface.mean_c + surface.amplitude_c * Math.cos(w * (tEnd - surface.phase_days));
    }
    case 'daily': {
      const v = surface.temperature_c;
      return (tStart) => v[Math.floor(tStart + 1e-9) % v.length];
    }
  }
}

/** Runs the `ground` command on validated input. */
export function runGround(input: GroundInput): GroundOutput {
  const depth = input.layers.reduce((s, l) => s + l.thickness_m, 0);
  input.output.depths_m.forEach((z, j) => {
    if (z > depth + 1e-12) throw new EngineInputError(`output.depths_m[${j}]`, `must be <= the column depth (${depth} m)`);
  });
  const every = input.output.every_days;
  const duration = input.duration_days;
  const reportCount = Math.floor(duration / every + 1e-9);
  if (reportCount > MAX_REPORTS) throw new EngineInputError('output.every_days', `gives more than ${MAX_REPORTS} reports; choose a longer interval`);

  const grid = buildColumnGrid(input.layers.map((l) => l.thickness_m));
  const dtDays = Math.min(1, duration / 2000);
  const steps = Math.ceil(duration / dtDays);
  if (grid.cellCount * steps > MAX_CELL_STEPS) {
    throw new EngineInputError(
      'duration_days',
      `with ${grid.cellCount} cells this run needs ${grid.cellCount * steps} cell-steps, more than the ${MAX_CELL_STEPS} the solver is allowed; shorten the run or the column`,
    );
  }
  const materials = input.layers.map((l) =>
    isothermalMaterial({
      conductivityThawedWmK: l.conductivity_thawed_w_mk,
      conductivityFrozenWmK: l.conductivity_frozen_w_mk,
      heatCapacityThawedJm3K: l.heat_capacity_thawed_j_m3k,
      heatCapacityFrozenJm3K: l.heat_capacity_frozen_j_m3k,
      latentHeatJm3: l.latent_heat_j_m3,
      freezingPointC: l.freezing_point_c,
    }),
  );
  const column = new HeatConductionColumn(grid, materials, { bottomHeatFluxWm2: input.bottom_heat_flux_w_m2 });
  column.setTemperatureProfile(initialProfile(input.initial_temperature_c));
  const depths = input.output.depths_m;
  column.setReportingDepths(depths);
  const surfaceAt = surfaceFunction(input.surface);
  const daily = input.surface.kind === 'daily';

  const out: GroundOutput = { times_days: [], thaw_depth_m: [], temperature_c: [], annual: [], time_step_days: dtDays, cell_count: grid.cellCount };
  const yearCount = Math.floor(duration / DAYS_PER_YEAR + 1e-9);
  let prevMinH: Float64Array | null = null;
  let prevMaxH: Float64Array | null = null;
  let nextReport = 1;
  let nextYear = 1;
  let t = 0;
  const eps = 1e-9 * Math.max(1, duration);
  while (t < duration - eps) {
    // the next event: a report, a year end, a day boundary (daily surface) or the end
    let event = duration;
    if (nextReport <= reportCount) event = Math.min(event, nextReport * every);
    if (nextYear <= yearCount) event = Math.min(event, nextYear * DAYS_PER_YEAR);
    if (daily) event = Math.min(event, Math.floor(t + eps) + 1);
    const gap = event - t;
    const h = gap <= dtDays * (1 + 1e-9) ? gap : gap < 2 * dtDays ? gap / 2 : dtDays;
    const tEnd = gap <= dtDays * (1 + 1e-9) ? event : t + h;
    column.step((tEnd - t) * SECONDS_PER_DAY, surfaceAt(t, tEnd));
    t = tEnd;
    if (nextReport <= reportCount && Math.abs(t - nextReport * every) <= eps) {
      out.times_days.push(round(nextReport * every, 6));
      out.thaw_depth_m.push(round(column.thawDepthM()));
      out.temperature_c.push(depths.map((z) => round(column.temperatureAtDepthC(z))));
      nextReport++;
    }
    if (nextYear <= yearCount && Math.abs(t - nextYear * DAYS_PER_YEAR) <= eps) {
      const st = column.statistics();
      let talik = false;
      if (prevMinH && prevMaxH) {
        const min2 = st.minEnthalpyJm3.map((v, i) => Math.min(v, prevMinH![i]));
        const max2 = st.maxEnthalpyJm3.map((v, i) => Math.max(v, prevMaxH![i]));
        talik = column.detectTalik(min2, max2, 0.2) !== null;
      }
      const table = column.permafrostTableM(st.maxEnthalpyJm3);
      out.annual.push({
        year: nextYear,
        max_thaw_depth_m: round(st.maxThawDepthM),
        mean_temperature_c: Array.from(st.meanTemperatureC, (v) => round(v)),
        min_temperature_c: Array.from(st.minTemperatureC, (v) => round(v)),
        max_temperature_c: Array.from(st.maxTemperatureC, (v) => round(v)),
        talik,
        permafrost_table_m: table === null ? null : round(table),
      });
      prevMinH = st.minEnthalpyJm3;
      prevMaxH = st.maxEnthalpyJm3;
      column.resetStatistics();
      nextYear++;
    }
  }
  return out;
}

export const groundCommand: EngineCommand<typeof groundInputSchema, GroundOutput> = {
  schema: groundInputSchema,
  run: runGround,
};
