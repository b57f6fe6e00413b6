import { getTranslations } from 'next-intl/server';
import { signOutAction } from '@/lib/actions/sign-out';

/** A plain form post: works before the page's JavaScript has loaded. */
export async function SignOutButton({ className }: { className?: string }) {
  const t = await getTranslations('auth');
  return (
    <form action={signOutAction}>
      <button type="submit" className={className ?? 'rounded border border-snow-300 bg-ice-raised px-3 py-1.5 text-sm hover:bg-snow-100'}>
        {t('signOutButton')}
      </button>
    </form>
  );
}
