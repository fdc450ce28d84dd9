// Every API route and every page × anonymous, owner, yard hand, yard hand granted the saw, saw
// operator. Routes and pages are found on disk; what each may do comes from the permissions table
// (lib/auth/permissions.ts), read off the action each handler and page declares. A new route or
// page without a declared action fails here until it is listed as public on purpose.
import { readdirSync, readFileSync } from 'node:fs';
import path from 'node:path';
import { NextRequest } from 'next/server';
import { afterAll, beforeAll, describe, expect, it, vi } from 'vitest';
import * as schema from '@/db/schema';
import { hashPassword } from '@/lib/auth/password';
import { isPublicAction, userCan, type Action } from '@/lib/auth/permissions';
import { actAs, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { recordCells } from './matrix-figures';

class Interrupt extends Error {
  constructor(
    public readonly kind: 'redirect' | 'forbidden' | 'notFound',
    public readonly to?: string,
  ) {
    super(kind);
  }
}
vi.mock('next/navigation', async (importOriginal) => ({
  ...(await importOriginal<typeof import('next/navigation')>()),
  redirect: (to: string) => {
    throw new Interrupt('redirect', to);
  },
  forbidden: () => {
    throw new Interrupt('forbidden');
  },
  notFound: () => {
    throw new Interrupt('notFound');
  },
}));

const ROOT = path.resolve(__dirname, '../..');
/** Routes anyone may call: the sign-in machinery and the health check. */
const PUBLIC_API = new Set([
  'GET /api/health',
  'GET /api/auth/[...nextauth]',
  'POST /api/auth/[...nextauth]',
]);
// The customer's quote page: the unguessable, expiring token in its address is the authority.
const PUBLIC_PAGES = new Set(['/sign-in', '/q/[token]']);
/** Bodies for routes where an empty JSON object would do slow work (a full solve). */
const BODIES: Record<string, unknown> = { 'POST /api/jobs/[jobId]/plans': { timeLimitMs: 200 } };
const METHODS = ['GET', 'POST', 'PUT', 'PATCH', 'DELETE'] as const;

type Person = { name: string; userId: number | null; role?: schema.User['role']; canUseSaw?: boolean };
const PEOPLE: Person[] = [
  { name: 'anonymous', userId: null },
  { name: 'saw operator', userId: 3, role: 'saw_operator' },
  { name: 'yard hand', userId: 2, role: 'yard_hand' },
  { name: 'yard hand with the saw', userId: 4, role: 'yard_hand', canUseSaw: true },
  { name: 'owner', userId: 1, role: 'owner' },
];

function filesNamed(dir: string, name: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((entry) => {
    const full = path.join(dir, entry.name);
    if (entry.isDirectory()) return filesNamed(full, name);
    return entry.name === name ? [full] : [];
  });
}
const urlPathOf = (file: string) =>
  '/' +
  path
    .relative(path.join(ROOT, 'app'), path.dirname(file))
    .split(path.sep)
    .filter((part) => !/^\(.*\)$/.test(part))
    .join('/');
const sampleParams = (urlPath: string) =>
  Object.fromEntries([...urlPath.matchAll(/\[([^\]]+)\]/g)].map((m) => [m[1].replace('...', ''), '1']));

let t: Awaited<ReturnType<typeof useApiTestDb>>;
beforeAll(async () => {
  t = await useApiTestDb();
  await t.db.insert(schema.users).values({
    id: 4,
    email: 'hand2@yard.test',
    name: 'Sawing Hand',
    role: 'yard_hand',
    canUseSaw: true,
    passwordHash: await hashPassword('long-enough'),
  });
});
afterAll(async () => {
  await t.close();
  await closeTemplate();
});

type Handler = ((req: NextRequest, ctx: { params: Promise<unknown> }) => Promise<Response>) & {
  action?: Action;
  bodyKind?: 'json' | 'csv';
};

describe('API routes', () => {
  const routeFiles = filesNamed(path.join(ROOT, 'app/api'), 'route.ts');

  it('finds the routes on disk', () => expect(routeFiles.length).toBeGreaterThan(30));

  it('answers 401 anonymous, 403 to roles without the action, and neither (nor 5xx) to the rest', async () => {
    let cells = 0;
    const leaks: string[] = [];
    for (const file of routeFiles) {
      const urlPath = urlPathOf(file);
      const mod = (await import(file)) as Record<string, Handler>;
      for (const method of METHODS) {
        const handler = mod[method];
        if (!handler) continue;
        const key = `${method} ${urlPath}`;
        if (PUBLIC_API.has(key)) continue;
        expect(
          handler.action,
          `${key} declares no action (wrap it in route()) and is not public`,
        ).toBeDefined();
        for (const person of PEOPLE) {
          actAs(person.userId);
          const csv = handler.bodyKind === 'csv';
          const init: { method: string; headers: Record<string, string>; body?: string } = {
            method,
            headers: { 'content-type': csv ? 'text/csv' : 'application/json' },
          };
          if (method !== 'GET')
            init.body = csv ? 'section,length,quantity\n' : JSON.stringify(BODIES[key] ?? {});
          const res = await handler(new NextRequest(`http://test.local${urlPath}`, init), {
            params: Promise.resolve(sampleParams(urlPath)),
          });
          cells++;
          // Public actions (the customer's quote link, the signed webhook) need no sign-in.
          const open = isPublicAction(handler.action!);
          const allowed =
            open || (person.role !== undefined && userCan(person as Required<Person>, handler.action!));
          const expected = allowed ? 'allowed' : person.role === undefined ? '401' : '403';
          const got =
            res.status === 401 ? '401' : res.status === 403 ? '403' : res.status < 500 ? 'allowed' : '5xx';
          if (got !== expected) leaks.push(`${key} as ${person.name}: ${res.status} (expected ${expected})`);
        }
      }
    }
    recordCells('api', cells, leaks.length);
    expect(leaks).toEqual([]);
  }, 300_000); // hundreds of handler calls: minutes on a loaded 2-core machine
});

describe('pages', () => {
  const pageFiles = filesNamed(path.join(ROOT, 'app'), 'page.tsx');
  const actionsIn = (file: string) =>
    [...readFileSync(file, 'utf8').matchAll(/requirePageUser\(\s*'([a-z:]+)'\s*\)/g)].map(
      (m) => m[1] as Action,
    );
  const guarded = (file: string) => /requirePageUser\(/.test(readFileSync(file, 'utf8'));
  /** The page's layouts that check the user, outermost first. */
  const guardLayouts = (pageFile: string) => {
    const layouts: string[] = [];
    for (let dir = path.dirname(pageFile); dir.startsWith(path.join(ROOT, 'app')); dir = path.dirname(dir)) {
      const layout = path.join(dir, 'layout.tsx');
      try {
        if (guarded(layout)) layouts.unshift(layout);
      } catch {
        // no layout at this level
      }
    }
    return layouts;
  };

  it('sends anonymous visitors to sign in, answers 403 (forbidden()) to roles without the action', async () => {
    let cells = 0;
    const leaks: string[] = [];
    for (const file of pageFiles) {
      const urlPath = urlPathOf(file);
      if (PUBLIC_PAGES.has(urlPath)) continue;
      const chain = [...guardLayouts(file), file];
      expect(chain.some(guarded), `${urlPath} never calls requirePageUser and is not public`).toBe(true);
      const actions = chain.flatMap(actionsIn);
      for (const person of PEOPLE) {
        actAs(person.userId);
        let got = 'allowed';
        try {
          for (const part of chain) {
            const Component = (await import(part)).default as (props: unknown) => Promise<unknown>;
            await Component({
              children: null,
              params: Promise.resolve(sampleParams(urlPath)),
              searchParams: Promise.resolve({}),
            });
          }
        } catch (error) {
          if (!(error instanceof Interrupt)) throw error;
          got =
            error.kind === 'forbidden'
              ? '403'
              : error.kind === 'redirect' && error.to === '/sign-in'
                ? 'sign-in'
                : 'allowed';
        }
        cells++;
        const allowed =
          person.role !== undefined && actions.every((a) => userCan(person as Required<Person>, a));
        const expected = person.role === undefined ? 'sign-in' : allowed ? 'allowed' : '403';
        if (got !== expected) leaks.push(`${urlPath} as ${person.name}: ${got} (expected ${expected})`);
      }
    }
    recordCells('pages', cells, leaks.length);
    expect(leaks).toEqual([]);
  }, 300_000); // hundreds of handler calls: minutes on a loaded 2-core machine

  it('keeps the saw operator out of jobs, office plans and cut sheets', () => {
    const saw = { role: 'saw_operator' as const };
    for (const action of ['jobs:read', 'jobs:edit', 'plans:read', 'reports:read'] as Action[]) {
      expect(userCan(saw, action), action).toBe(false);
    }
  });
});
