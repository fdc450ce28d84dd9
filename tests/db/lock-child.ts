// A separate process for the lock tests: loads, says "ready", and races for the folder on "go".
//   lock DIR  – takes the lock, holds it a moment, prints "won" or "refused"
//   write DIR – opens the database and prints "ack REF" after each committed job
import { once } from 'node:events';
import { acquireDataDirLock } from '../../db/data-dir-lock';

const [mode, dir] = process.argv.slice(2);
const { openDatabase } = mode === 'write' ? await import('../../db/client') : { openDatabase: null };
const { jobs } = await import('../../db/schema');
console.log('ready');
await once(process.stdin, 'data');
try {
  if (!openDatabase) {
    acquireDataDirLock(dir);
    console.log('won');
    await new Promise((resolve) => setTimeout(resolve, 300));
  } else {
    const { db, client } = await openDatabase(dir);
    for (let i = 0; i < 10; i++) {
      const reference = `J-${process.pid}-${i}`;
      await db.insert(jobs).values({ reference, customerName: 'Lock test' });
      console.log(`ack ${reference}`);
    }
    await client.close();
  }
} catch (error) {
  console.log(`refused ${(error as Error).message}`);
}
process.exit(0);
