/** The demo yard is seeded as of this moment, so dated history and reports are the same every run. */
export const DEMO_NOW = new Date('2026-11-20T09:00:00Z');
