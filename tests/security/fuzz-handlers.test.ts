// Property: whatever JSON or CSV a signed-in owner sends to any write handler, the answer is 2xx
// or 4xx (never 5xx), and a 4xx leaves every table exactly as it was. Handlers are found on disk,
// so new routes are fuzzed too. Run counts are modest to keep the suite quick.
import { readdirSync } from 'node:fs';
import path from 'node:path';
import fc from 'fast-check';
import { NextRequest } from 'next/server';
import { afterAll, beforeAll, describe, expect, it } from 'vitest';
import { actAs, AS, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';
import { recordCells } from './matrix-figures';

const ROOT = path.resolve(__dirname, '../..');
const RUNS_PER_HANDLER = 6;
/** Skipped: a full solve per case would make this slow; its body is a small strict schema, fuzzed as JSON below. */
const SLOW = new Set<string>([]);

type Handler = ((req: NextRequest, ctx: { params: Promise<unknown> }) => Promise<Response>) & {
  action?: string;
  bodyKind?: 'json' | 'csv';
};

function routeFiles(dir: string): string[] {
  return readdirSync(dir, { withFileTypes: true }).flatMap((e) =>
    e.isDirectory()
      ? routeFiles(path.join(dir, e.name))
      : e.name === 'route.ts'
        ? [path.join(dir, e.name)]
        : [],
  );
}

// Strings from every Unicode plane, NUL and other control characters, and very long ones.
const nasty = fc.oneof(
  fc.string({ unit: 'binary', maxLength: 40 }),
  fc.constantFrom('\u0000', 'a\u0000b', '𝄞🪵', '\uD800', '=HYPERLINK("x")', '+1', '0x10', ' 1 ', '€', ''),
  fc.string({ unit: 'grapheme', minLength: 5_000, maxLength: 6_000 }),
);
const numbers = fc.oneof(
  fc.integer(),
  fc.constantFrom(2 ** 31, 2 ** 53, -(2 ** 31) - 1, 1e308, -0, 0.5, Number.MAX_SAFE_INTEGER),
  fc.double({ noNaN: true, noDefaultInfinity: true }),
);
const value: fc.Arbitrary<unknown> = fc.letrec((tie) => ({
  v: fc.oneof(
    { depthSize: 'small' },
    nasty,
    numbers,
    fc.boolean(),
    fc.constant(null),
    fc.array(tie('v'), { maxLength: 4 }),
    fc.dictionary(
      fc.oneof(
        nasty,
        fc.constantFrom('id', 'sectionId', 'length', 'quantity', 'csv', 'reference', 'email', 'panels'),
      ),
      tie('v'),
      { maxKeys: 5 },
    ),
  ),
})).v;
// Bodies shaped like the real ones, with nasty values in known field names.
const FIELDS = [
  'customer',
  'reference',
  'sectionId',
  'length',
  'quantity',
  'label',
  'note',
  'email',
  'name',
  'role',
  'password',
  'location',
  'ids',
  'csv',
  'jobId',
  'lines',
  'timeLimitMs',
  'kerfMm',
  'to',
  'reason',
];
const shaped = fc.dictionary(fc.constantFrom(...FIELDS), value, { minKeys: 1, maxKeys: 6 });
const jsonBody = fc.oneof(
  shaped.map((v) => JSON.stringify(v)),
  value.map((v) => JSON.stringify(v) ?? 'null'),
  nasty,
);
const csvBody = fc.oneof(
  fc
    .array(
      fc.array(nasty, { maxLength: 5 }).map((cells) => cells.join(',')),
      { maxLength: 8 },
    )
    .map((rows) => ['section,length,quantity,label', ...rows].join('\n')),
  nasty,
);
const ids = fc.oneof(
  fc.constantFrom('1', '2', '3', '0', '-1', '+1', '1 ', '0x10', '2147483648', '99999999999999999999'),
  fc.nat().map(String),
);

let t: Awaited<ReturnType<typeof useApiTestDb>>;
let digest: () => Promise<string>;
beforeAll(async () => {
  t = await useApiTestDb();
  const tables = (
    await t.client.query<{ name: string }>(
      `select table_name as name from information_schema.tables where table_schema = 'public' order by 1`,
    )
  ).rows.map((r) => r.name);
  // One checksum over every row of every table.
  const query = tables
    .map(
      (name) =>
        `select '${name}' as t, coalesce(md5(string_agg(x::text, '|' order by x::text)), '') as h from "${name}" x`,
    )
    .join(' union all ');
  digest = async () => JSON.stringify((await t.client.query(query)).rows);
});
afterAll(async () => {
  await t.close();
  await closeTemplate();
});

describe('fuzzing every JSON and CSV write handler', () => {
  it('answers 2xx or 4xx, and a 4xx changes nothing', async () => {
    let cases = 0;
    const fiveHundreds: string[] = [];
    const changedOn4xx: string[] = [];
    // The tables' checksum before the next case: each case's "after" is the next one's "before",
    // so every case costs one checksum rather than two.
    let before = await digest();
    for (const file of routeFiles(path.join(ROOT, 'app/api'))) {
      const urlPath =
        '/' + path.relative(path.join(ROOT, 'app'), path.dirname(file)).split(path.sep).join('/');
      const mod = (await import(file)) as Record<string, Handler>;
      for (const method of ['POST', 'PUT', 'PATCH'] as const) {
        const handler = mod[method];
        const key = `${method} ${urlPath}`;
        if (!handler?.action || SLOW.has(key)) continue;
        const names = [...urlPath.matchAll(/\[([^\]]+)\]/g)].map((m) => m[1]);
        await fc.assert(
          fc.asyncProperty(
            handler.bodyKind === 'csv' ? csvBody : jsonBody,
            fc.array(ids, { minLength: names.length, maxLength: names.length }),
            async (body, values) => {
              actAs(AS.owner);
              const res = await handler(
                new NextRequest(`http://test.local${urlPath}`, {
                  method,
                  headers: { 'content-type': handler.bodyKind === 'csv' ? 'text/csv' : 'application/json' },
                  body,
                }),
                { params: Promise.resolve(Object.fromEntries(names.map((n, i) => [n, values[i]]))) },
              );
              cases++;
              const after = await digest();
              if (res.status >= 500) fiveHundreds.push(`${key} ${res.status} ${body.slice(0, 120)}`);
              else if (res.status >= 400 && after !== before) changedOn4xx.push(`${key} ${res.status}`);
              before = after;
            },
          ),
          { numRuns: RUNS_PER_HANDLER, seed: 20261202 },
        );
      }
    }
    recordCells('fuzz', cases, fiveHundreds.length + changedOn4xx.length);
    expect(fiveHundreds).toEqual([]);
    expect(changedOn4xx).toEqual([]);
  }, 300_000); // hundreds of handler calls: minutes on a loaded 2-core machine
});
