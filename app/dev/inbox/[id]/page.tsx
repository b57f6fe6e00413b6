import Link from 'next/link';
import { notFound } from 'next/navigation';
import { Fragment } from 'react';
import { getInboxMessage } from '@/lib/data/dev-inbox';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Message · Development inbox' };

/** The plain-text part with its links made clickable (the HTML part is not rendered: no script, no CSP exceptions). */
function Linkified({ text }: { text: string }) {
  const parts = text.split(/(https?:\/\/[^\s<>"]+)/g);
  return (
    <>
      {parts.map((p, i) =>
        /^https?:\/\//.test(p) ? (
          <a key={i} href={p} className="break-all text-frost underline">{p}</a>
        ) : (
          <Fragment key={i}>{p}</Fragment>
        ),
      )}
    </>
  );
}

export default async function DevInboxMessagePage({ params }: { params: Promise<{ id: string }> }) {
  const { id } = await params;
  const m = await getInboxMessage(id);
  if (!m) notFound();
  return (
    <main id="main" className="mx-auto max-w-3xl px-6 py-10">
      <Link href="/dev/inbox" className="text-sm text-frost underline">← Development inbox</Link>
      <h1 className="mt-4 text-2xl font-bold">{m.subject || '(no subject)'}</h1>
      <dl className="mt-2 grid grid-cols-[auto_1fr] gap-x-4 text-sm text-ink-soft">
        <dt>From</dt><dd>{m.from}</dd>
        <dt>To</dt><dd>{m.to.join(', ')}</dd>
        <dt>Received</dt><dd>{m.receivedAt}</dd>
        {m.attachments.length > 0 && (<><dt>Attachments</dt><dd>{m.attachments.map((a) => `${a.filename} (${a.contentType}, ${Math.round(a.size / 1024)} KiB)`).join(', ')}</dd></>)}
      </dl>
      <pre className="mt-6 whitespace-pre-wrap rounded border border-snow-200 bg-ice-raised p-4 font-sans text-sm leading-relaxed">
        <Linkified text={m.text} />
      </pre>
    </main>
  );
}
