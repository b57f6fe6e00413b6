'use client';

import { useState, useTransition } from 'react';
import { useRouter } from 'next/navigation';
import { useTranslations } from 'next-intl';
import { switchOrganisationAction } from '@/lib/actions/preferences';

export interface SwitcherOption {
  organisationId: string;
  organisationName: string;
  role: string;
}

/** Shows the active organisation; a select only when the person belongs to more than one. */
export function OrganisationSwitcher({ options, activeId }: { options: SwitcherOption[]; activeId: string }) {
  const t = useTranslations('workspace');
  const router = useRouter();
  const [pending, startTransition] = useTransition();
  const [error, setError] = useState<string | null>(null);
  const active = options.find((o) => o.organisationId === activeId);
  if (options.length < 2) return <span className="font-bold">{active?.organisationName}</span>;
  return (
    <span>
      <label htmlFor="org-switch" className="sr-only">{t('switchOrganisation')}</label>
      <select
        id="org-switch"
        className="rounded border border-snow-300 bg-ice-raised px-2 py-1 font-bold"
        value={activeId}
        disabled={pending}
        onChange={(e) => {
          const organisationId = e.target.value;
          startTransition(async () => {
            const result = await switchOrganisationAction({ organisationId });
            if (result && !result.ok) setError(result.message);
            else router.push('/workspace');
            router.refresh();
          });
        }}
      >
        {options.map((o) => (
          <option key={o.organisationId} value={o.organisationId}>
            {o.organisationName}
          </option>
        ))}
      </select>
      {error ? <span role="alert" className="ml-2 text-sm text-rust">{error}</span> : null}
    </span>
  );
}
