// The `server-only` marker outside Next (see server-process.cjs): nothing to do.
