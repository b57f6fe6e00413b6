import { NextResponse } from 'next/server';
import { getHealth } from '@/lib/data/health';

export const dynamic = 'force-dynamic';

/** Database reachable, migrations current, mail service reachable: 200, or 503 with the reasons. */
export async function GET() {
  const health = await getHealth();
  return NextResponse.json(health, { status: health.ok ? 200 : 503, headers: { 'Cache-Control': 'no-store' } });
}
