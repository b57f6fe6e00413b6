import { describe, expect, it } from 'vitest';
import config from '@/tailwind.config';

/**
 * WCAG 2.2 relative luminance and contrast ratio, as the standard defines them (W3C WCAG 2.2,
 * "relative luminance" and "contrast ratio" in the glossary; success criteria 1.4.3 and 1.4.11).
 */
function luminance(hex: string): number {
  const [r, g, b] = [1, 3, 5].map((i) => parseInt(hex.slice(i, i + 2), 16) / 255).map((c) => (c <= 0.04045 ? c / 12.92 : ((c + 0.055) / 1.055) ** 2.4));
  return 0.2126 * r! + 0.7152 * g! + 0.0722 * b!;
}
function contrast(a: string, b: string): number {
  const [hi, lo] = [luminance(a), luminance(b)].sort((x, y) => y - x);
  return (hi! + 0.05) / (lo! + 0.05);
}

const c = config.theme!.extend!.colors as Record<string, Record<string, string>>;

// Text pairs the interface uses: [foreground, background, what].
const textPairs: [string, string, string][] = [
  [c.ink!.DEFAULT!, c.ice!.DEFAULT!, 'body text on the page'],
  [c.ink!.soft!, c.ice!.DEFAULT!, 'secondary text'],
  [c.ink!.muted!, c.ice!.raised!, 'muted text on cards'],
  [c.ink!.muted!, c.ice!.DEFAULT!, 'muted text on the page'],
  [c.frost!.DEFAULT!, c.ice!.DEFAULT!, 'links'],
  [c.frost!.DEFAULT!, c.ice!.raised!, 'links on cards'],
  ['#ffffff', c.frost!.DEFAULT!, 'primary button text'],
  ['#ffffff', c.frost!.strong!, 'primary button hover'],
  [c.ink!.DEFAULT!, c.frost!.pale!, 'caution panel'],
  [c.ink!.DEFAULT!, c.thaw!.pale!, 'demo notice'],
  [c.thaw!.DEFAULT!, c.ice!.DEFAULT!, 'above-zero temperatures'],
  [c.rust!.DEFAULT!, c.ice!.raised!, 'alert text'],
  [c.lichen!.DEFAULT!, c.ice!.raised!, 'calm-state text'],
  [c.ink!.DEFAULT!, c.rust!.pale!, 'alert panel'],
  [c.ink!.DEFAULT!, c.lichen!.pale!, 'calm panel'],
];

describe('palette contrast (WCAG 2.2 AA: 4.5:1 for normal text)', () => {
  it.each(textPairs)('%s on %s (%s)', (fg, bg) => {
    expect(contrast(fg, bg)).toBeGreaterThanOrEqual(4.5);
  });

  it('the formula gives the extremes of the standard: black on white 21:1, a colour on itself 1:1', () => {
    expect(contrast('#000000', '#ffffff')).toBeCloseTo(21, 5);
    expect(contrast('#1d5a85', '#1d5a85')).toBeCloseTo(1, 10);
  });
});
