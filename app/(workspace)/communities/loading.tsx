export default function Loading() {
  return (
    <main id="main" className="mx-auto max-w-6xl px-6 py-8" aria-busy="true">
      <div className="h-8 w-56 animate-pulse rounded bg-snow-200" />
      <div className="mt-6 h-[420px] animate-pulse rounded bg-snow-100" />
    </main>
  );
}
