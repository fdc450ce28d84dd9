import { ApiError } from './fetch-json';

export type FieldIssue = { path: string; message: string };

/** The field issues of a 422 answer, as the server listed them (empty for any other error). */
export function fieldIssues(error: unknown): FieldIssue[] {
  if (!(error instanceof ApiError)) return [];
  return (error.body as { issues?: FieldIssue[] } | null)?.issues ?? [];
}

/** Field messages by path (`name`, `lines.0.quantity`) from a failed request: the one way forms read them. */
export function fieldErrors(error: unknown): Record<string, string> {
  return Object.fromEntries(fieldIssues(error).map((i) => [i.path, i.message]));
}
