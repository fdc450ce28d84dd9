import { PGlite } from '@electric-sql/pglite';
import { migrate } from 'drizzle-orm/pglite/migrator';
import { migrationsFolder, wrapClient } from '@/db/client';
import { seedDemoYard } from '@/lib/demo-yard';
import { DEMO_NOW } from './support/demo-now';
const t = () => performance.now();
let a = t();
const c = new PGlite(); await c.waitReady; console.log('empty start', (t()-a).toFixed(0));
a = t(); await migrate(wrapClient(c), { migrationsFolder }); console.log('migrate', (t()-a).toFixed(0));
a = t(); const c2 = new PGlite(); await c2.waitReady; console.log('2nd empty start', (t()-a).toFixed(0));
if (process.argv[2] === 'demo') { a = t(); await seedDemoYard(wrapClient(c), DEMO_NOW); console.log('seed', (t()-a).toFixed(0)); }
a = t(); const dump = await c.dumpDataDir('none'); const buf = Buffer.from(await dump.arrayBuffer()); console.log('dump', (t()-a).toFixed(0), 'bytes', buf.length);
a = t(); const c3 = new PGlite({ loadDataDir: new Blob([buf]) }); await c3.waitReady; console.log('load', (t()-a).toFixed(0));
a = t(); await c3.query('select count(*) from jobs'); console.log('first query', (t()-a).toFixed(0));
a = t(); const c4 = await c3.clone(); console.log('clone', (t()-a).toFixed(0));
