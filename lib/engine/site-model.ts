/**
 * The site model: joins the climate modules and the ground solver for one community ground
 * profile (a validated `Site`).
 *
 * This module gathers the site model's parts, one file a topic (import from here):
 * - site-model-preparation.ts: `prepareSite(site, options)` → `PreparedSite` (the extended column,
 *   layers to ≥ 50 m, its grid and materials, regional factors, daily snow, surface n-factors);
 *   `createSiteColumn(prepared)` → a `HeatConductionColumn` for it.
 * - site-model-forcing.ts: `dailySnowCovers`, `surfaceTemperatureC`, `monthlySeriesFor`.
 * - site-model-spin-up.ts: `spinUp(column, prepared, params, monthlyC, warmStart?, maxYears?)` →
 *   `SpinUpReport`: from the steady geothermal profile to the periodic state under a fixed cycle.
 * - site-model-run.ts: `runYears(column, prepared, params, series, from, to, carry, observed?)` →
 *   `YearRecord[]`.
 * - site-model-calibration.ts: `calibrateSurface(prepared, start, targets, offsets)`.
 * - site-model-history.ts: `computeHistory(prepared)` → `SiteHistory`: calibration, spin-up under
 *   the site's 1850–1900 climate, transient 1850–2014 (+ the baseline years after 2014 under
 *   SSP2-4.5), the 2014 state and the baseline diagnostics, shared by every scenario and cached by
 *   assess.ts; `runScenario(prepared, history, scenario, lastYear)` → the years 2015..lastYear.
 *
 * Surface forcing per day (documented choices):
 * - air temperature: monthly values from local-climate.ts made daily by the mean-preserving
 *   interpolation of monthly-to-daily.ts (365-day years);
 * - without snow: T_surface = n_t · T_air when T_air > 0, n_f · T_air otherwise (n-factors,
 *   Lunardini 1978; UFC 3-130-04; Klene et al. 2001);
 * - snow on the ground (covers that are not snow-cleared): the air temperature (n = 1) is imposed on
 *   the top of a snow layer of the day's depth and density, conductivity by Sturm et al. (1997), so
 *   the freezing n-factor is NOT applied (the table's vegetation values already include snow);
 *   snow-cleared covers (roads, airstrips: n-factors.ts says which) carry no snow and use n_f;
 * - daily snow depth from the monthly depths by the same mean-preserving interpolation, clipped at 0
 *   and zero through any month whose mean depth is 0.
 *
 * Year diagnostics (per 365-day calendar year, extremes over every solver step):
 * seasonal thaw = largest thaw depth from the surface, bounded by the depth the winter froze to
 * (once a talik forms, the seasonal layer above it); permafrost table = top of the ground that
 * stayed frozen all year (null: no permafrost in the column); talik = a layer ≥ 0.2 m that stayed
 * thawed through this year and the one before, below the seasonal freezing depth, with permafrost
 * below (heat-conduction.ts `detectTalik` over the two-year extremes); mean/min/max temperature at
 * the envelope depths; air mean, thawing index (calendar year), freezing index (winter ending in
 * the year, 1 July – 30 June; air-indices.ts).
 *
 * References:
 * [1] M. Sturm, J. Holmgren, M. König, K. Morris, "The thermal conductivity of seasonal snow,"
 *     J. Glaciol. 43(143), 26–41, 1997, doi:10.3189/S0022143000002781.
 * [2] V. J. Lunardini, "Theory of n-factors and correlation of data," Proc. 3rd Int. Conf.
 *     Permafrost, Edmonton, 1978, 40–46.
 * [3] UFC 3-130-04 (formerly TM 5-852-4), Arctic and subarctic construction: foundations for
 *     structures, U.S. Dept. of Defense.
 * [4] J. M. Klene, F. E. Nelson, N. I. Shiklomanov, K. M. Hinkel, "The n-factor in natural
 *     landscapes," Arct. Antarct. Alp. Res. 33(2), 140–148, 2001, doi:10.2307/1552214.
 * [5] R. O. van Everdingen (ed.), Multi-language glossary of permafrost and related ground-ice
 *     terms, IPA, 1998 (depth of zero annual amplitude; 0.1 °C threshold from memory).
 * [6] V. E. Romanovsky, T. E. Osterkamp, "Thawing of the active layer on the coastal plain of the
 *     Alaskan Arctic," Permafrost Periglac. Process. 8, 1–22, 1997 (the steady geothermal profile
 *     below the active layer, T(z) = T_top + q ∫ dz / k).
 */
export * from './site-model-preparation';
export * from './site-model-forcing';
export * from './site-model-run';
export * from './site-model-spin-up';
export * from './site-model-calibration';
export * from './site-model-history';
