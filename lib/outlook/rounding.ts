/**
 * Rounding and number formatting for what people read: "about" rather than false precision.
 *
 * Steps (the house voice guide, design-language.md): thaw depth to 0.1 m, settlement to 5 cm,
 * temperature to 0.1 °C. Thawing and freezing indices to 10 °C·days (a screening choice: the
 * engine gives whole degree-days, but the last digit carries no information at this level).
 * Halves round away from zero (common practice in reporting). Negative numbers use the minus sign
 * U+2212, as ISO 80000-1 and typographic practice write it (common practice).
 */

/**
 * Rounds to a multiple of a step, halves away from zero.
 * @param value Any finite number [any unit].
 * @param step Positive step [same unit], e.g. 0.1 or 0.05.
 * @returns The nearest multiple of `step` [same unit]; never −0.
 * Assumptions: `step` is a "nice" decimal; the result is cleaned of binary float noise at 1e-9.
 */
export function roundToStep(value: number, step: number): number {
  if (!(step > 0)) throw new RangeError('step must be > 0');
  if (!Number.isFinite(value)) throw new RangeError('value must be finite');
  const n = Math.round(Math.abs(value) / step + 1e-9) * step * Math.sign(value);
  const clean = Math.round(n * 1e9) / 1e9;
  return clean === 0 ? 0 : clean;
}

/**
 * Thaw depth or depth to the permafrost table for reading.
 * @param depthM Depth below the surface [m], ≥ 0.
 * @returns Depth rounded to 0.1 m [m].
 */
export const roundDepthM = (depthM: number): number => roundToStep(depthM, 0.1);

/**
 * Settlement for reading, in 5 cm steps.
 * @param settlementM Cumulative settlement [m], ≥ 0.
 * @returns Settlement rounded to 5 cm [cm], an integer multiple of 5.
 */
export const roundSettlementCm = (settlementM: number): number => Math.round(roundToStep(settlementM * 100, 5));

/**
 * Temperature for reading.
 * @param temperatureC Temperature [°C].
 * @returns Temperature rounded to 0.1 °C [°C].
 */
export const roundTemperatureC = (temperatureC: number): number => roundToStep(temperatureC, 0.1);

/**
 * Thawing or freezing index for reading.
 * @param indexCDays Index [°C·days], ≥ 0.
 * @returns Index rounded to 10 °C·days [°C·days].
 */
export const roundIndexCDays = (indexCDays: number): number => roundToStep(indexCDays, 10);

/**
 * How settlement reads: none at all, under the first 5 cm step, or about so many centimetres.
 * @param settlementM Cumulative settlement [m].
 * @returns `{ kind: 'none' }` for 0, `{ kind: 'under', cm: 5 }` when above 0 but rounding to 0,
 *   else `{ kind: 'about', cm }` [cm].
 */
export function settlementReading(settlementM: number): { kind: 'none' } | { kind: 'under'; cm: 5 } | { kind: 'about'; cm: number } {
  if (settlementM <= 0) return { kind: 'none' };
  const cm = roundSettlementCm(settlementM);
  return cm === 0 ? { kind: 'under', cm: 5 } : { kind: 'about', cm };
}

/** Window-mean temperatures from this value up to 0 °C read "close to thawing" [°C] (a screening choice). */
export const CLOSE_TO_THAWING_C = -0.5;

/**
 * Where a ground temperature stands for the plain-language text.
 * @param temperatureC Mean ground temperature [°C] (rounded to 0.1 °C first, so the words agree
 *   with the number shown).
 * @returns 'thawed' above 0 °C, 'close' from −0.5 °C to 0 °C, else 'frozen'.
 * Assumptions: freezing at 0 °C; saline pore water freezes lower, so 'close' is the careful side.
 */
export function groundTemperatureState(temperatureC: number): 'thawed' | 'close' | 'frozen' {
  const t = roundTemperatureC(temperatureC);
  if (t > 0) return 'thawed';
  if (t >= CLOSE_TO_THAWING_C) return 'close';
  return 'frozen';
}

/**
 * Formats a number for a locale with a fixed number of decimals and a true minus sign.
 * @param value Number, already rounded [any unit].
 * @param digits Decimals shown.
 * @param locale BCP 47 tag (en, fr, ru, nb).
 */
export function formatNumber(value: number, digits: number, locale: string): string {
  const v = Object.is(value, -0) ? 0 : value;
  return new Intl.NumberFormat(locale, { minimumFractionDigits: digits, maximumFractionDigits: digits, useGrouping: true })
    .format(v)
    .replace(/^-/, '\u2212');
}

export const formatDepth = (depthM: number, locale: string) => formatNumber(roundDepthM(depthM), 1, locale);
export const formatTemperature = (temperatureC: number, locale: string) => formatNumber(roundTemperatureC(temperatureC), 1, locale);
export const formatIndex = (indexCDays: number, locale: string) => formatNumber(roundIndexCDays(indexCDays), 0, locale);
