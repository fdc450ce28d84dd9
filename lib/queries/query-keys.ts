// Every client cache key comes from here, for reading and for invalidating. Each resource has one
// root, so invalidating `x.all` refreshes everything shown about it.
import type { JobFilters } from './jobs';
import type { RackFilters } from './offcuts';

export const offcutKeys = {
  all: ['offcuts'] as const,
  list: (filters: Partial<RackFilters>) => ['offcuts', 'list', filters] as const,
};

export const sectionKeys = {
  all: ['sections'] as const,
};

export const stockKeys = {
  movements: ['stock-movements'] as const,
};

export const userKeys = {
  all: ['users'] as const,
};

export const customerKeys = {
  all: ['customers'] as const,
  search: (q: string) => ['customers', 'search', q] as const,
};

export const jobKeys = {
  all: ['jobs'] as const,
  list: (filters: JobFilters) => ['jobs', 'list', filters] as const,
  detail: (jobId: number) => ['jobs', jobId] as const,
};

export const planKeys = {
  all: ['plans'] as const,
  detail: (planId: number) => ['plans', planId] as const,
  progress: (planId: number) => ['plans', planId, 'progress'] as const,
  stockCheck: (planId: number) => ['plans', planId, 'stock-check'] as const,
};

export const sawKeys = {
  all: ['saw'] as const,
  queue: ['saw', 'queue'] as const,
  plan: (planId: number) => ['saw', 'plan', planId] as const,
};

export const frameKeys = {
  all: ['frame-schedules'] as const,
  detail: (id: number) => ['frame-schedules', id] as const,
};
