// Demo customers (invented): the demo jobs' customers with contact details and accounts. Any other
// customer name on a seeded job becomes a plain retail record, as the migration does for real yards.
import { sql } from 'drizzle-orm';
import type { Tx } from '@/db/types';
import * as schema from '@/db/schema';

type SeedTx = Tx;

export const demoYardDetails = {
  yardAddress: 'Unit 4, Wharf Road, Kelderby KD3 7QX',
  vatNumber: 'GB 100 2026 01',
};

export const demoCustomers: schema.NewCustomer[] = [
  {
    name: 'Priya Halloran',
    phone: '07700 900418',
    email: 'priya.halloran@example.com',
    address: '12 Orchard Rise, Kelderby',
    account: 'retail',
  },
  {
    name: 'Fenwick Joinery',
    contact: 'Sam Fenwick',
    phone: '01632 960233',
    email: 'orders@fenwick-joinery.example.com',
    address: 'Yard 2, Mill Lane, Kelderby',
    account: 'trade',
    creditDays: 30,
    discountPercent: 10,
  },
  {
    name: 'Ade Thornbury',
    phone: '07700 900752',
    email: 'ade.t@example.com',
    address: '3 Beck Cottages, Lowfold',
    account: 'retail',
  },
  {
    name: 'Cobb Lane Allotments',
    contact: 'the secretary',
    email: 'secretary@cobblane.example.org',
    address: 'Cobb Lane, Kelderby',
    account: 'retail',
  },
  {
    name: 'Marlow & Keyes Builders',
    contact: 'Dee Keyes',
    phone: '01632 960871',
    email: 'accounts@marlowkeyes.example.com',
    address: '8 Station Yard, Lowfold',
    account: 'trade',
    creditDays: 45,
    discountPercent: 12,
  },
];

export async function seedDemoCustomers(tx: SeedTx) {
  await tx.update(schema.yardSettings).set(demoYardDetails);
  await tx.insert(schema.customers).values(demoCustomers);
  await tx.execute(sql`
    insert into customers (name, email, phone)
    select distinct on (lower(trim(j.customer_name))) trim(j.customer_name), j.customer_email, j.customer_phone
    from jobs j
    where trim(j.customer_name) <> ''
      and not exists (select 1 from customers c where lower(c.name) = lower(trim(j.customer_name)))
    order by lower(trim(j.customer_name)), j.created_at desc`);
  await tx.execute(sql`
    update jobs set customer_id = c.id, customer_phone = c.phone from customers c
    where lower(trim(jobs.customer_name)) = lower(c.name)`);
}
