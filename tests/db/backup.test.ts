import { mkdtempSync, writeFileSync } from 'node:fs';
import { tmpdir } from 'node:os';
import path from 'node:path';
import { sql } from 'drizzle-orm';
import { afterAll, describe, expect, it } from 'vitest';
import { readVerifiedBackup, restoreSnapshot, writeBackup } from '@/db/backup';
import { requestSnapshot, serveBackups } from '@/db/backup-socket';
import { setDbForTests } from '@/db';
import { openDatabase, type EmbeddedDb } from '@/db/client';
import { acquireDataDirLock } from '@/db/data-dir-lock';
import * as schema from '@/db/schema';
import { minimalYard } from '../support/minimal-yard';

const root = mkdtempSync(path.join(tmpdir(), 'kerfwise-backup-'));
/** Every row of every table the database has (the migrations' own table too), in a fixed order. */
async function everyTable(db: EmbeddedDb): Promise<Record<string, unknown[]>> {
  const { rows: tables } = await db.execute<{ name: string }>(sql`
    select format('%I.%I', table_schema, table_name) as name from information_schema.tables
    where table_type = 'BASE TABLE' and table_schema not in ('pg_catalog', 'information_schema')
    order by 1`);
  const out: Record<string, unknown[]> = {};
  for (const { name } of tables) {
    const { rows } = await db.execute(sql.raw(`select * from ${name} t order by t::text`));
    out[name.replace(/^public\./, '')] = JSON.parse(JSON.stringify(rows));
  }
  return out;
}

describe('backup and restore', () => {
  const source = path.join(root, 'live');
  let opened: Awaited<ReturnType<typeof openDatabase>>;
  afterAll(async () => {
    await opened?.client.close();
    opened?.release();
  });

  it('restores a snapshot taken from a running server with every table equal', async () => {
    opened = await openDatabase(source);
    setDbForTests(opened.db); // the fixture writes through the lib functions
    await minimalYard(opened.db);
    setDbForTests(undefined);
    const server = await serveBackups(source, opened.client);

    // Writes keep coming while the snapshot is taken; the restore must hold whole transactions only.
    let writing = true;
    const writes = (async () => {
      // Bounded, and pausing between writes, so the snapshot can take the database between transactions.
      for (let i = 0; writing && i < 500; i++) {
        await new Promise((resolve) => setTimeout(resolve, 2));
        await opened.db.transaction(async (tx) => {
          const [job] = await tx
            .insert(schema.jobs)
            .values({ reference: `J-BK-${i}`, customerName: 'Backup test' })
            .returning();
          await tx
            .insert(schema.jobItems)
            .values({ jobId: job.id, sectionId: 1, lengthMm: 1000 + i, quantity: 1 });
        });
      }
    })();
    const bytes = await requestSnapshot(source);
    writing = false;
    await writes;
    server.close();
    const file = path.join(root, 'snapshot.tar.gz');
    writeBackup(file, bytes);

    const target = path.join(root, 'restored');
    const release = acquireDataDirLock(target);
    await restoreSnapshot(target, readVerifiedBackup(file));
    release();
    const restored = await openDatabase(target);
    const got = await everyTable(restored.db);
    await restored.client.close();
    restored.release();

    const jobsInBackup = (got.jobs as { reference: string }[]).filter((j) => j.reference.startsWith('J-BK-'));
    const itemsInBackup = (got.job_items as { job_id: number }[]).filter((i) =>
      (got.jobs as { id: number; reference: string }[]).some(
        (j) => j.id === i.job_id && j.reference.startsWith('J-BK-'),
      ),
    );
    expect(itemsInBackup).toHaveLength(jobsInBackup.length); // no job without its item

    // Now compare every table with the live database as it was at the snapshot: drop later writes.
    const live = await everyTable(opened.db);
    const kept = new Set(jobsInBackup.map((j) => j.reference));
    const liveJobs = (live.jobs as { id: number; reference: string }[]).filter(
      (j) => !j.reference.startsWith('J-BK-') || kept.has(j.reference),
    );
    const liveJobIds = new Set(liveJobs.map((j) => j.id));
    live.jobs = liveJobs;
    live.job_items = (live.job_items as { job_id: number }[]).filter((i) => liveJobIds.has(i.job_id));
    expect(Object.keys(got)).toEqual(Object.keys(live));
    for (const name of Object.keys(live)) expect(got[name], name).toEqual(live[name]);
    expect(got.users.length).toBeGreaterThan(0);
    console.log(
      `backup restore: ${Object.keys(got).length} tables, ${Object.values(got).reduce((n, rows) => n + rows.length, 0)} rows equal`,
    );
  }, 600_000);

  it('refuses a damaged backup and a folder that is not empty', async () => {
    const file = path.join(root, 'damaged.tar.gz');
    writeBackup(file, Buffer.from('a snapshot'));
    writeFileSync(file, 'a snapshoT');
    expect(() => readVerifiedBackup(file)).toThrow(/does not match its checksum/);
    await expect(restoreSnapshot(source, Buffer.from('x'))).rejects.toThrow(/not empty/);
  });
});
