'use client';
// The one way a client form changes data: TanStack Query's mutation, the caches it makes stale
// refreshed by key, and the server's field messages ready for the form.
import { useMutation, useQueryClient, type QueryKey } from '@tanstack/react-query';
import { fieldErrors } from './field-errors';

type Options<TData, TVars> = {
  mutationFn: (vars: TVars) => Promise<TData>;
  /** Keys (from query-keys.ts) whose data this change makes stale. */
  invalidates?: readonly QueryKey[];
  onSuccess?: (data: TData, vars: TVars) => unknown;
  onError?: (error: Error, vars: TVars) => unknown;
};

export function useApiMutation<TData, TVars = void>({
  mutationFn,
  invalidates = [],
  onSuccess,
  onError,
}: Options<TData, TVars>) {
  const queryClient = useQueryClient();
  const mutation = useMutation<TData, Error, TVars>({
    mutationFn,
    onSuccess: async (data, vars) => {
      await onSuccess?.(data, vars);
      // Awaited, so the form stays busy until the page shows the change.
      await Promise.all(invalidates.map((queryKey) => queryClient.invalidateQueries({ queryKey })));
    },
    onError: (error, vars) => onError?.(error, vars),
  });
  return { ...mutation, fieldErrors: fieldErrors(mutation.error) };
}
