import type { HazardLevel } from '@/lib/outlook/result';

/**
 * The concern rating as a shape AND a word, never colour alone (WCAG 2.2 SC 1.4.1): a circle for
 * lower, a triangle for moderate, a square for higher concern. The shape is decorative for screen
 * readers; the word carries the meaning.
 */
const STYLE: Record<HazardLevel, { fill: string; stroke: string }> = {
  low: { fill: '#466e33', stroke: '#466e33' },
  moderate: { fill: '#d99a48', stroke: '#9a5a14' },
  high: { fill: '#9e3519', stroke: '#9e3519' },
};

export function HazardShape({ level, size = 14 }: { level: HazardLevel; size?: number }) {
  const s = STYLE[level];
  return (
    <svg width={size} height={size} viewBox="0 0 14 14" aria-hidden="true" focusable="false" className="inline-block shrink-0 align-[-2px]">
      {level === 'low' ? <circle cx="7" cy="7" r="5.5" fill={s.fill} stroke={s.stroke} strokeWidth="1.5" /> : null}
      {level === 'moderate' ? <path d="M7 1.2 L13 12.6 H1 Z" fill={s.fill} stroke={s.stroke} strokeWidth="1.5" strokeLinejoin="round" /> : null}
      {level === 'high' ? <rect x="1.5" y="1.5" width="11" height="11" fill={s.fill} stroke={s.stroke} strokeWidth="1.5" /> : null}
    </svg>
  );
}

export function HazardMark({ level, word, detail }: { level: HazardLevel; word: string; detail?: string }) {
  return (
    <span className="inline-flex items-start gap-1.5">
      <HazardShape level={level} />
      <span>
        <span className="font-bold">{word}</span>
        {detail ? <span className="block text-xs text-ink-muted">{detail}</span> : null}
      </span>
    </span>
  );
}
