import { describe, expect, it } from 'vitest';
import {
  formatDepth,
  formatNumber,
  formatTemperature,
  groundTemperatureState,
  roundDepthM,
  roundSettlementCm,
  roundTemperatureC,
  roundToStep,
  settlementReading,
} from './rounding';

// The steps are the house voice guide's (design-language.md, "Voice": thaw depth to 0.1 m,
// settlement to 5 cm steps, temperature to 0.1 °C). Halves away from zero: common practice.

describe('rounding for readers', () => {
  it('settlement goes in 5 cm steps (design-language.md)', () => {
    expect(roundSettlementCm(0.017)).toBe(0);
    expect(roundSettlementCm(0.026)).toBe(5);
    expect(roundSettlementCm(0.072)).toBe(5);
    expect(roundSettlementCm(0.074)).toBe(5);
    expect(roundSettlementCm(0.076)).toBe(10);
    expect(roundSettlementCm(0.407)).toBe(40);
    expect(roundSettlementCm(0.825)).toBe(85); // exactly half a step: away from zero (common practice)
    for (const m of [0.003, 0.12, 0.33, 0.61, 1.234]) expect(roundSettlementCm(m) % 5).toBe(0);
  });

  it('settlement above zero never reads as none (design-language.md: "about" rather than false precision)', () => {
    expect(settlementReading(0)).toEqual({ kind: 'none' });
    expect(settlementReading(0.004)).toEqual({ kind: 'under', cm: 5 });
    expect(settlementReading(0.024)).toEqual({ kind: 'under', cm: 5 });
    expect(settlementReading(0.026)).toEqual({ kind: 'about', cm: 5 });
    expect(settlementReading(0.407)).toEqual({ kind: 'about', cm: 40 });
  });

  it('thaw depth to 0.1 m and temperature to 0.1 °C (design-language.md)', () => {
    expect(roundDepthM(0.603)).toBe(0.6);
    expect(roundDepthM(1.449)).toBe(1.4);
    expect(roundDepthM(1.45)).toBe(1.5);
    expect(roundDepthM(2.522)).toBe(2.5);
    expect(roundTemperatureC(-1.87)).toBe(-1.9);
    expect(roundTemperatureC(-0.04)).toBe(0);
    expect(Object.is(roundTemperatureC(-0.04), -0)).toBe(false);
    expect(roundToStep(0.1 + 0.2, 0.1)).toBe(0.3); // no binary float noise in what is shown
    expect(() => roundToStep(1, 0)).toThrow(RangeError);
  });

  it('formats with the locale and a true minus sign (ISO 80000-1 writes the minus as U+2212; common practice)', () => {
    expect(formatTemperature(-3.14, 'en')).toBe('\u22123.1');
    expect(formatTemperature(-0.04, 'en')).toBe('0.0');
    expect(formatDepth(1.449, 'fr')).toBe('1,4');
    expect(formatNumber(4150, 0, 'en')).toBe('4,150');
  });

  it('reads ground near 0 °C as close to thawing, on the rounded figure (design-language.md: "close to thawing", not "still frozen")', () => {
    expect(groundTemperatureState(-3.1)).toBe('frozen');
    expect(groundTemperatureState(-0.56)).toBe('frozen');
    expect(groundTemperatureState(-0.54)).toBe('close');
    expect(groundTemperatureState(-0.2)).toBe('close');
    expect(groundTemperatureState(0.04)).toBe('close');
    expect(groundTemperatureState(0.3)).toBe('thawed');
  });
});
