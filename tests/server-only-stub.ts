// vitest runs outside the React server environment, where `server-only` would throw on import.
export {};
