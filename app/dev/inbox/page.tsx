import Link from 'next/link';
import { notFound } from 'next/navigation';
import { listInbox } from '@/lib/data/dev-inbox';

export const dynamic = 'force-dynamic';
export const metadata = { title: 'Development inbox' };

export default async function DevInboxPage({ searchParams }: { searchParams: Promise<{ to?: string }> }) {
  const { to } = await searchParams;
  const messages = await listInbox(typeof to === 'string' && to ? to : undefined);
  if (!messages) notFound();
  return (
    <main id="main" className="mx-auto max-w-4xl px-6 py-10">
      <h1 className="text-2xl font-bold">Development inbox</h1>
      <p className="mt-1 text-sm text-ink-soft">
        Every message the local mail service received. This page exists only in development and demo runs (DEV_INBOX).
      </p>
      <form className="mt-4 flex gap-2" action="/dev/inbox">
        <label className="sr-only" htmlFor="to">Recipient</label>
        <input id="to" name="to" type="email" defaultValue={to ?? ''} placeholder="Filter by recipient" className="w-72 rounded border border-snow-300 px-3 py-1.5" />
        <button className="rounded bg-frost px-3 py-1.5 font-bold text-white">Filter</button>
      </form>
      {messages.length === 0 ? (
        <p className="mt-6">No messages yet.</p>
      ) : (
        <table className="mt-6 w-full text-left text-sm">
          <thead className="border-b border-snow-300">
            <tr><th className="py-2">Received (UTC)</th><th>To</th><th>Subject</th></tr>
          </thead>
          <tbody>
            {messages.map((m) => (
              <tr key={m.id} className="border-b border-snow-200">
                <td className="py-2 pr-4 whitespace-nowrap">{m.receivedAt.replace('T', ' ').slice(0, 19)}</td>
                <td className="pr-4">{m.to.join(', ')}</td>
                <td><Link className="text-frost underline" href={`/dev/inbox/${m.id}`}>{m.subject || '(no subject)'}</Link></td>
              </tr>
            ))}
          </tbody>
        </table>
      )}
    </main>
  );
}
