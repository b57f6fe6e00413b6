// node scripts/wait-for-url.mjs URL [seconds] [pid] — waits until URL answers 200; exits 1 on time-out
// or when the process PID (the server being waited for) has died. (curl is not on a fresh machine.)
const [url, seconds = '60', pid] = process.argv.slice(2);
const deadline = Date.now() + Number(seconds) * 1000;
const alive = () => {
  if (!pid) return true;
  try { process.kill(Number(pid), 0); return true; } catch { return false; }
};
while (Date.now() < deadline) {
  try {
    const res = await fetch(url, { signal: AbortSignal.timeout(5000) });
    if (res.ok) process.exit(0);
  } catch {}
  if (!alive()) process.exit(1);
  await new Promise((r) => setTimeout(r, 500));
}
process.exit(1);
