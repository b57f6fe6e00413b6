import { getTranslations } from 'next-intl/server';

/**
 * A wide table's frame: scrolls sideways on a narrow screen, says so below the width where it
 * scrolls, and can be scrolled with the keyboard (focusable region with a name, WCAG 2.1.1).
 */
export async function ScrollRegion({ label, minWidth, children }: { label: string; minWidth: 'md' | 'lg'; children: React.ReactNode }) {
  const t = await getTranslations('outlook');
  return (
    <>
      <p className={`mt-1 text-xs text-ink-soft ${minWidth === 'md' ? 'md:hidden' : 'lg:hidden'}`}>
        <span aria-hidden="true">{'\u2194 '}</span>
        {t('scrollHint')}
      </p>
      <div role="region" aria-label={label} tabIndex={0} className="mt-2 overflow-x-auto rounded focus:outline-2 focus:outline-frost">
        {children}
      </div>
    </>
  );
}
