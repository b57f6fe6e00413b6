import Link from 'next/link';
import { getTranslations } from 'next-intl/server';
import { getGroundProfile } from '@/lib/data/communities';
import { siteSchema } from '@/lib/engine';
import { DemoNotice } from '@/components/community/demo-badge';

const MONTHS = ['Jan', 'Feb', 'Mar', 'Apr', 'May', 'Jun', 'Jul', 'Aug', 'Sep', 'Oct', 'Nov', 'Dec'];
const fmt = (v: number, digits = 1) => v.toLocaleString('en', { minimumFractionDigits: digits, maximumFractionDigits: digits });

function layerDepths<T extends { thickness_m: number }>(layers: T[]): (T & { top: number; bottom: number })[] {
  const out: (T & { top: number; bottom: number })[] = [];
  for (const l of layers) {
    const top = out.length ? out[out.length - 1]!.bottom : 0;
    out.push({ ...l, top, bottom: top + l.thickness_m });
  }
  return out;
}

export default async function GroundProfilePage({ params }: { params: Promise<{ slug: string; profile: string }> }) {
  const { slug, profile } = await params;
  const t = await getTranslations('profile');
  const to = await getTranslations('outlook');
  const p = await getGroundProfile(slug, profile);
  // Stored versions were validated on write; parsing again gives the defaults and typed values.
  const site = siteSchema.parse(p.site);
  const temps = site.climate.monthly_air_temperature_c;
  const maat = temps.reduce((a, b) => a + b, 0) / 12;
  const density = site.snow.density_kg_m3;
  const layers = layerDepths(site.layers);
  const checklist = Object.entries(site.checklist ?? {});

  return (
    <main id="main" className="mx-auto max-w-6xl space-y-8 px-6 py-8">
      <DemoNotice show={p.community.isDemo} />
      <nav className="text-sm">
        <Link href="/communities" className="text-frost underline">{t('communities')}</Link> /{' '}
        <Link href={`/communities/${p.community.slug}`} className="text-frost underline">{p.community.name}</Link> / {p.name}
      </nav>
      <header>
        <h1 className="text-2xl font-bold">{p.name}</h1>
        <p className="text-sm text-ink-soft">
          {t('versionLine', { version: p.currentVersion, date: p.updatedAt.slice(0, 10) })} · {p.sourceNote}
        </p>
        <p className="mt-3">
          <Link href={`/communities/${p.community.slug}/profiles/${p.slug}/outlook`} className="inline-block rounded bg-frost px-4 py-2 font-bold text-white hover:bg-frost-strong">{to('openLink')}</Link>
          <span className="ml-3 text-sm text-ink-soft">{to('openLinkHelp')}</span>
        </p>
      </header>

      <section aria-labelledby="climate">
        <h2 id="climate" className="text-lg font-bold">{t('climateTitle', { start: site.climate.baseline_period[0], end: site.climate.baseline_period[1] })}</h2>
        <div className="mt-2 overflow-x-auto">
          <table className="w-full min-w-[640px] text-right text-sm">
            <thead className="border-b border-snow-300 text-ink-soft">
              <tr><th className="py-1 text-left font-normal">{t('month')}</th>{MONTHS.map((m) => <th key={m} className="font-normal">{m}</th>)}<th className="font-bold">{t('year')}</th></tr>
            </thead>
            <tbody>
              <tr className="border-b border-snow-200">
                <th className="py-1 text-left font-normal">{t('airTemperature')}</th>
                {temps.map((v, i) => <td key={i} className={v > 0 ? 'text-thaw' : 'text-frost'}>{fmt(v)}</td>)}
                <td className="font-bold">{fmt(maat)}</td>
              </tr>
              <tr className="border-b border-snow-200">
                <th className="py-1 text-left font-normal">{t('snowDepth')}</th>
                {site.snow.monthly_depth_m.map((v, i) => <td key={i}>{fmt(v, 2)}</td>)}
                <td />
              </tr>
              <tr>
                <th className="py-1 text-left font-normal">{t('snowDensity')}</th>
                {MONTHS.map((_, i) => <td key={i}>{Array.isArray(density) ? density[i] : density}</td>)}
                <td />
              </tr>
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="ground">
        <h2 id="ground" className="text-lg font-bold">{t('groundTitle')}</h2>
        <p className="mt-1 text-sm text-ink-soft">
          {t('surfaceLine', { cover: t(`cover.${site.surface.cover}`), salinity: site.pore_water_salinity_ppt, flux: site.bottom_heat_flux_w_m2 })}
        </p>
        <div className="mt-2 overflow-x-auto">
          <table className="w-full min-w-[720px] text-sm">
            <thead className="border-b border-snow-300 text-left text-ink-soft">
              <tr>
                <th className="py-1 font-normal">{t('depth')}</th>
                <th className="font-normal">{t('material')}</th>
                <th className="text-right font-normal">{t('dryDensity')}</th>
                <th className="text-right font-normal">{t('waterContent')}</th>
                <th className="font-normal">{t('ice')}</th>
              </tr>
            </thead>
            <tbody>
              {layers.map((l, i) => (
                <tr key={i} className="border-b border-snow-200">
                  <td className="py-1 whitespace-nowrap">{fmt(l.top, 2)}–{fmt(l.bottom, 2)}</td>
                  <td>{l.description ?? l.texture} <span className="text-ink-muted">({l.texture})</span></td>
                  <td className="text-right">{l.dry_density_kg_m3}</td>
                  <td className="text-right">{fmt(l.volumetric_water_content, 2)}</td>
                  <td>
                    {l.ice_class === 'unknown' ? t('iceUnknown') : l.ice_class}
                    {l.excess_ice_content !== undefined ? ` · ${t('excessIce', { value: Math.round(l.excess_ice_content * 100) })}` : ''}
                  </td>
                </tr>
              ))}
            </tbody>
          </table>
        </div>
      </section>

      <section aria-labelledby="checklist">
        <h2 id="checklist" className="text-lg font-bold">{t('checklistTitle')}</h2>
        <p className="mt-1 text-sm text-ink-soft">{t('checklistHelp')}</p>
        {checklist.length === 0 ? (
          <p className="mt-2 text-sm">{t('checklistEmpty')}</p>
        ) : (
          <ul className="mt-2 grid gap-1 text-sm sm:grid-cols-2">
            {checklist.map(([k, v]) => (
              <li key={k} className="flex justify-between gap-4 rounded bg-ice-raised px-3 py-1">
                <span>{t(`check.${k}`)}</span>
                <span className={v === 'present' ? 'font-bold text-rust' : 'text-ink-soft'}>{t(`answer.${v}`)}</span>
              </li>
            ))}
          </ul>
        )}
      </section>

      <section aria-labelledby="versions">
        <h2 id="versions" className="text-lg font-bold">{t('versionsTitle')}</h2>
        <ul className="mt-2 text-sm">
          {p.versions.map((v) => (
            <li key={v.version}>{t('versionItem', { version: v.version, date: v.createdAt.slice(0, 10) })}{v.sourceNote ? ` — ${v.sourceNote}` : ''}</li>
          ))}
        </ul>
        <p className="mt-1 text-xs text-ink-muted">{t('hash', { hash: p.siteSha256.slice(0, 16) })}</p>
      </section>
    </main>
  );
}
