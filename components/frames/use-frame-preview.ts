'use client';

import { useEffect, useState } from 'react';
import type { FramePreviewBodyInput } from '@/lib/frames';
import { previewFramesRequest, type FramePreviewDto } from '@/lib/queries/frames';
import { fieldIssues } from '@/lib/queries/field-errors';
import { useApiMutation } from '@/lib/queries/use-api-mutation';

/** Field messages by panel index and field name, from a 422's `panels.2.centres` paths. */
export function panelIssues(error: unknown) {
  const issues = fieldIssues(error);
  const byPanel: Record<number, Record<string, string>> = {};
  const top: Record<string, string> = {};
  for (const issue of issues) {
    const match = /^panels\.(\d+)\.(\w+)/.exec(issue.path);
    if (match) (byPanel[Number(match[1])] ??= {})[match[2]] = issue.message;
    else top[issue.path || 'schedule'] = issue.message;
  }
  return { byPanel, top, count: issues.length };
}

/** Live preview: asks the server for the cut list 400 ms after the last edit; null body = nothing to ask. */
export function useFramePreview(body: FramePreviewBodyInput | null) {
  const key = body ? JSON.stringify(body) : null;
  const [sentKey, setSentKey] = useState<string | null>(null);
  // The last good answer stays on screen while the next one is on its way, so drawings do not flicker.
  const [lastGood, setLastGood] = useState<FramePreviewDto | undefined>(undefined);
  const { mutate, ...preview } = useApiMutation({ mutationFn: previewFramesRequest, onSuccess: setLastGood });
  useEffect(() => {
    if (!key || key === sentKey) return;
    const timer = setTimeout(() => {
      setSentKey(key);
      mutate(JSON.parse(key) as FramePreviewBodyInput);
    }, 400);
    return () => clearTimeout(timer);
  }, [key, sentKey, mutate]);
  return { ...preview, data: key ? lastGood : undefined, waiting: key !== sentKey || preview.isPending };
}
