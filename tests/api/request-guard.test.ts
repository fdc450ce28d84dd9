// Cross-site writes, body types and sizes, NUL characters and id parsing are checked once, in the
// route wrapper, for every handler (OWASP CSRF Prevention Cheat Sheet: verify Origin; require a
// non-form content type).
import { afterAll, afterEach, beforeEach, describe, expect, it } from 'vitest';
import { POST as importItems } from '@/app/api/jobs/[jobId]/items/import/route';
import { GET as listOffcuts } from '@/app/api/offcuts/route';
import { GET as getJob } from '@/app/api/jobs/[jobId]/route';
import { GET as listUsers, POST as createUser } from '@/app/api/users/route';
import { attachmentDisposition } from '@/lib/api/attachment';
import { JSON_BODY_LIMIT_BYTES } from '@/lib/api/request-guard';
import { offcutsToCsv } from '@/lib/offcuts/offcuts-csv';
import { actAs, AS, call, useApiTestDb } from '../support/api';
import { closeTemplate } from '../support/test-db';

let db: Awaited<ReturnType<typeof useApiTestDb>>;
beforeEach(async () => {
  db = await useApiTestDb();
  actAs(AS.owner);
});
afterEach(() => db.close());
afterAll(closeTemplate);

const newOwner = { email: 'intruder@else.test', name: 'Intruder', role: 'owner', password: 'long-enough' };
const userCount = async () => (await call(listUsers)).json.users.length as number;

describe('cross-site writes', () => {
  it('refuses a text/plain form body from another origin and creates nothing', async () => {
    const before = await userCount();
    const res = await call(createUser, {
      method: 'POST',
      body: newOwner,
      headers: { 'content-type': 'text/plain', origin: 'http://evil.test' },
    });
    expect(res.status).toBe(403);
    expect(await userCount()).toBe(before);
  });

  it('refuses a JSON body from another origin, or from a sibling site by Sec-Fetch-Site', async () => {
    const foreign = await call(createUser, {
      method: 'POST',
      body: newOwner,
      headers: { origin: 'http://evil.test' },
    });
    expect(foreign.status).toBe(403);
    const sibling = await call(createUser, {
      method: 'POST',
      body: newOwner,
      headers: { 'sec-fetch-site': 'same-site' },
    });
    expect(sibling.status).toBe(403);
  });

  it('refuses text/plain and form bodies even from our own origin (415)', async () => {
    for (const type of [
      'text/plain',
      'application/x-www-form-urlencoded',
      'multipart/form-data; boundary=x',
    ]) {
      const res = await call(createUser, {
        method: 'POST',
        body: newOwner,
        headers: { 'content-type': type, origin: 'http://test.local' },
      });
      expect(res.status, type).toBe(415);
    }
    const ok = await call(createUser, {
      method: 'POST',
      body: newOwner,
      headers: { origin: 'http://test.local' },
    });
    expect(ok.status).toBe(201);
  });

  it('takes only CSV types on the cut-list upload', async () => {
    const csv = 'section,length,quantity\n90x45 MGP10,2400,2\n';
    const plain = await call(importItems, {
      method: 'POST',
      params: { jobId: '1' },
      body: csv,
      headers: { 'content-type': 'text/plain' },
    });
    expect(plain.status).toBe(415);
  });
});

describe('body size and NUL characters', () => {
  it('answers 413 for a body over the limit, declared or streamed', async () => {
    const big = JSON.stringify({ ...newOwner, name: 'x'.repeat(JSON_BODY_LIMIT_BYTES) });
    expect((await call(createUser, { method: 'POST', body: big })).status).toBe(413);
    const declared = await call(createUser, {
      method: 'POST',
      body: newOwner,
      headers: { 'content-length': String(100 * 1024 * 1024) },
    });
    expect(declared.status).toBe(413);
  });

  it('answers 422 for a NUL in a JSON string, a key, a CSV upload or a query', async () => {
    const before = await userCount();
    const res = await call(createUser, { method: 'POST', body: { ...newOwner, name: 'A\u0000B' } });
    expect(res.status).toBe(422);
    const key = await call(createUser, { method: 'POST', body: { ...newOwner, ['x\u0000']: 1 } });
    expect(key.status).toBe(422);
    const csv = await call(importItems, {
      method: 'POST',
      params: { jobId: '1' },
      body: 'section,length,quantity\n90x45\u0000,2400,2\n',
      headers: { 'content-type': 'text/csv' },
    });
    expect(csv.status).toBe(422);
    expect((await call(listOffcuts, { url: 'http://test.local/api/offcuts?q=a%00b' })).status).toBe(422);
    expect(await userCount()).toBe(before);
  });
});

describe('ids and numbers', () => {
  it('accepts only plain positive integers within the column range as ids', async () => {
    expect((await call(getJob, { params: { jobId: '1' } })).status).toBe(200);
    for (const jobId of [
      '+1',
      '1 ',
      ' 1',
      '0x10',
      '1e0',
      '01',
      '1.0',
      '2147483648',
      '99999999999999999999',
      '-1',
      '',
    ]) {
      expect((await call(getJob, { params: { jobId } })).status, JSON.stringify(jobId)).toBe(404);
    }
  });

  it('answers 422, not 500, for huge numbers in a query', async () => {
    for (const q of [
      'sectionId=99999999999999',
      'minLengthMm=1e308',
      'page=2147483648',
      'maxLengthMm=2147483648',
    ]) {
      expect((await call(listOffcuts, { url: `http://test.local/api/offcuts?${q}` })).status, q).toBe(422);
    }
  });
});

describe('downloads', () => {
  it('gives an ASCII fallback and an RFC 5987 name for any reference', () => {
    // RFC 6266 §4.3 and RFC 5987 §3.2: filename* = UTF-8''percent-encoded
    expect(attachmentDisposition('cut-sheet-J-€1.pdf')).toBe(
      `attachment; filename="cut-sheet-J-_1.pdf"; filename*=UTF-8''cut-sheet-J-%E2%82%AC1.pdf`,
    );
    const header = attachmentDisposition('../../etc/"passwd"\r\n.pdf');
    expect(header).not.toMatch(/[\r\n]|\.\.\/|\\"/);
    expect(() => new Headers({ 'content-disposition': attachmentDisposition('J-€ 𝄞.pdf') })).not.toThrow();
  });

  it('escapes spreadsheet formulas in the rack export (OWASP CSV Injection)', () => {
    const csv = offcutsToCsv([
      {
        tag: '=HYPERLINK("http://evil.test")',
        sectionName: '+cmd',
        lengthMm: 900,
        location: '@SUM(A1)',
        status: 'available',
        origin: '-2+3',
        createdAt: new Date('2026-11-20T00:00:00Z'),
      },
    ]);
    const row = csv.split('\r\n')[1];
    expect(row).toContain(`"'=HYPERLINK(""http://evil.test"")"`);
    expect(row).toContain(`'+cmd`);
    expect(row).toContain(`'@SUM(A1)`);
    expect(row).toContain(`'-2+3`);
  });
});
