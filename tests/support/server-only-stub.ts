// Tests run lib/server outside Next.js; the "server-only" marker has nothing to guard there.
export {};
