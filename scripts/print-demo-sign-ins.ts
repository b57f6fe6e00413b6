/** Prints the demo sign-ins (used by scripts/start.sh). */
import { DEMO_PASSWORD, demoOrganisations, demoUsers, DEMO_REGION_NAME } from '../lib/demo/nivalen';

const base = process.argv[2] ?? 'http://localhost:3000';
const orgName = (slug: string) => demoOrganisations.find((o) => o.slug === slug)?.name ?? slug;
console.log(`\nDemo sign-ins (${DEMO_REGION_NAME}; every person and number in it is invented).`);
console.log(`Sign in at ${base}/sign-in with password "${DEMO_PASSWORD}", or ask for an e-mail link and open it from ${base}/dev/inbox:`);
for (const u of demoUsers) {
  const roles = u.memberships.map((m) => `${m.role} at ${orgName(m.organisation)}`).join('; ');
  console.log(`  ${u.email.padEnd(28)} ${roles}`);
}
