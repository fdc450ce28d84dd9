import type { Metadata } from 'next';
import { CustomerForm } from '@/components/customers/customer-form';
import { CustomerImport } from '@/components/customers/customer-import';
import { CustomerTable } from '@/components/customers/customer-table';
import { Card } from '@/components/ui/field';
import { PageHeader } from '@/components/ui/page-header';
import { requirePageUser } from '@/lib/auth/page-user';
import { can } from '@/lib/auth/permissions';
import { listCustomers } from '@/lib/customers/list-customers';

export const metadata: Metadata = { title: 'Customers' };
export const dynamic = 'force-dynamic';

type Props = { searchParams: Promise<{ q?: string }> };

export default async function CustomersPage({ searchParams }: Props) {
  const user = await requirePageUser('customers:read');
  const { q } = await searchParams;
  const customers = await listCustomers({ q: q?.trim().slice(0, 100) || undefined });
  return (
    <>
      <PageHeader
        title="Customers"
        lead="Retail customers and trade accounts with their credit terms and discount."
      />
      <div className="space-y-6">
        <form className="flex gap-2" role="search">
          <input
            name="q"
            defaultValue={q}
            placeholder="Name, contact, e-mail or phone"
            aria-label="Search customers"
            className="w-full max-w-md rounded border border-bark-soft px-3 py-2"
          />
          <button className="rounded bg-spruce px-4 py-2 font-semibold text-white">Search</button>
        </form>
        <Card className="overflow-x-auto p-0">
          <CustomerTable customers={customers} />
        </Card>
        {can(user.role, 'customers:edit') && (
          <div className="grid gap-6 lg:grid-cols-2">
            <Card>
              <h2 className="mb-3 text-xl font-bold">Add a customer</h2>
              <CustomerForm />
            </Card>
            <Card>
              <h2 className="mb-3 text-xl font-bold">Import customers from CSV</h2>
              <CustomerImport />
            </Card>
          </div>
        )}
      </div>
    </>
  );
}
