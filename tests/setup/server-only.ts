import { vi } from 'vitest';

// 'server-only' throws when imported outside a React Server Components bundle;
// tests run server code directly, so it is neutralised here and only here.
vi.mock('server-only', () => ({}));
