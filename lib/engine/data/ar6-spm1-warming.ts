/**
 * IPCC AR6 WG1 Table SPM.1: assessed change in global surface temperature [°C] relative to 1850–1900,
 * 20-year means, best estimate and very likely (5–95 %) range, for the five illustrative scenarios.
 * Used only as an independent check of the emulator (global-warming.test.ts).
 *
 * Source: IPCC, 2021: Summary for Policymakers, in Climate Change 2021: The Physical Science Basis,
 * Contribution of WG1 to AR6, Table SPM.1, doi:10.1017/9781009157896.001.
 * Provenance of the numbers: all values are from memory. The 2041–2060 best estimates and all
 * 2081–2100 values agree with a secondary reproduction of the table seen while writing this file;
 * the 2021–2040 values and the 2041–2060 ranges are from memory only.
 *
 * Also: observed warming 2011–2020 of 1.09 °C, very likely 0.95–1.20 °C (AR6 WG1 SPM A.1.2; from memory).
 */
import type { ScenarioId } from './ssp-forcing';

export interface AssessedWarming {
  best: number;
  low: number;
  high: number;
}

export const SPM1_PERIODS = [
  [2021, 2040],
  [2041, 2060],
  [2081, 2100],
] as const;

/** Per scenario: [near term 2021–2040, mid term 2041–2060, long term 2081–2100]. */
export const SPM1_WARMING_C: Readonly<Record<ScenarioId, readonly [AssessedWarming, AssessedWarming, AssessedWarming]>> = {
  'SSP1-1.9': [
    { best: 1.5, low: 1.2, high: 1.7 },
    { best: 1.6, low: 1.2, high: 2.0 },
    { best: 1.4, low: 1.0, high: 1.8 },
  ],
  'SSP1-2.6': [
    { best: 1.5, low: 1.2, high: 1.8 },
    { best: 1.7, low: 1.3, high: 2.2 },
    { best: 1.8, low: 1.3, high: 2.4 },
  ],
  'SSP2-4.5': [
    { best: 1.5, low: 1.2, high: 1.8 },
    { best: 2.0, low: 1.6, high: 2.5 },
    { best: 2.7, low: 2.1, high: 3.5 },
  ],
  'SSP3-7.0': [
    { best: 1.5, low: 1.2, high: 1.8 },
    { best: 2.1, low: 1.7, high: 2.6 },
    { best: 3.6, low: 2.8, high: 4.6 },
  ],
  'SSP5-8.5': [
    { best: 1.6, low: 1.3, high: 1.9 },
    { best: 2.4, low: 1.9, high: 3.0 },
    { best: 4.4, low: 3.3, high: 5.7 },
  ],
};

/** Observed 2011–2020 warming relative to 1850–1900 [°C] (AR6 WG1 SPM A.1.2; from memory). */
export const OBSERVED_2011_2020_C = { best: 1.09, low: 0.95, high: 1.2 } as const;
