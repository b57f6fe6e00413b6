/**
 * Physical constants and fixed parameters of the engine, each with its source.
 * Sections belong to the engine's topics; add to your topic's section only.
 */

// ---- Time ----------------------------------------------------------------------------------
/** Seconds in a day [s]. */
export const SECONDS_PER_DAY = 86_400;
/** Days in the model year [d]; the engine uses 365-day years (common practice in permafrost models). */
export const DAYS_PER_YEAR = 365;

// ---- Water and ice (ground topic) ---------------------------------------------------------

// ---- Climate (climate topic) ----------------------------------------------------------------

// ---- Ground ice and settlement (assess topic) -----------------------------------------------
