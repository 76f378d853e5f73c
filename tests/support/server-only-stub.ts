// Vitest runs outside React Server Components; the real package throws on import there.
export {};
