export default function Loading() {
  return (
    <main id="main" className="mx-auto max-w-4xl px-6 py-10" aria-busy="true">
      <div className="h-8 w-48 animate-pulse rounded bg-snow-200" />
      <div className="mt-4 h-4 w-full max-w-prose animate-pulse rounded bg-snow-100" />
      <div className="mt-2 h-4 w-3/4 max-w-prose animate-pulse rounded bg-snow-100" />
    </main>
  );
}
