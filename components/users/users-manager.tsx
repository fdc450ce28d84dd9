'use client';

import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import { Card, cardClass } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { usersQuery } from '@/lib/queries/users';
import { AddUserForm } from './add-user-form';
import { UserRow } from './user-row';
import { ScrollRegion } from '@/components/ui/scroll-region';
import { cn } from '@/lib/cn';
import { Table, TableHead } from '@/components/ui/table';

export function UsersManager() {
  const users = useQuery(usersQuery());
  const [rowError, setRowError] = useState<string | null>(null);

  return (
    <div className="space-y-6">
      <ScrollRegion label="Users" className={cn(cardClass, 'p-0')}>
        {rowError && (
          <Notice tone="error" className="m-4">
            {rowError}
          </Notice>
        )}
        {users.isPending && <p className="p-4">Loading accounts…</p>}
        {users.error && (
          <Notice tone="error" className="m-4">
            {users.error.message}
          </Notice>
        )}
        {users.data && (
          <Table data-testid="users-table">
            <TableHead columns={['Person', 'Role', 'Password', 'Access']} />
            <tbody>
              {users.data.map((user) => (
                <UserRow key={user.id} user={user} onError={setRowError} />
              ))}
            </tbody>
          </Table>
        )}
      </ScrollRegion>
      <Card>
        <h2 className="mb-4 text-xl font-bold">Add an account</h2>
        <AddUserForm />
      </Card>
    </div>
  );
}
