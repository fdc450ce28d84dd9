// A separate process for the lock tests: loads, says "ready", then races for folders on command.
//   lock       – on each line "go DIR": takes DIR's lock and keeps it, printing "won DIR" or
//                "refused DIR …"; one process serves every round, so the suite starts few processes
//   write DIR  – on "go": opens the database and prints "ack REF" after each committed job
import { createInterface } from 'node:readline';
import { acquireDataDirLock } from '../../db/data-dir-lock';

const [mode, dir] = process.argv.slice(2);
const { openDatabase } = mode === 'write' ? await import('../../db/client') : { openDatabase: null };
const { jobs } = await import('../../db/schema');
console.log('ready');
for await (const line of createInterface({ input: process.stdin })) {
  if (!openDatabase) {
    const folder = line.replace(/^go /, '');
    try {
      acquireDataDirLock(folder);
      console.log(`won ${folder}`);
    } catch (error) {
      console.log(`refused ${folder} ${(error as Error).message}`);
    }
    continue;
  }
  try {
    const { db, client } = await openDatabase(dir);
    for (let i = 0; i < 10; i++) {
      const reference = `J-${process.pid}-${i}`;
      await db.insert(jobs).values({ reference, customerName: 'Lock test' });
      console.log(`ack ${reference}`);
    }
    await client.close();
  } catch (error) {
    console.log(`refused ${(error as Error).message}`);
  }
  break;
}
process.exit(0);
