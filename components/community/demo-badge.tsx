import { getTranslations } from 'next-intl/server';

/** Says, wherever demo data is shown, that it is invented. */
export async function DemoNotice({ show = true }: { show?: boolean }) {
  if (!show) return null;
  const t = await getTranslations('common');
  return (
    <p className="rounded border border-thaw-fill bg-thaw-pale px-3 py-2 text-sm" role="note">
      {t('demoNotice')}
    </p>
  );
}
