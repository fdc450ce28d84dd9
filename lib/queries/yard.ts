import type { updateYardSettings } from '@/lib/yard/update-yard-settings';
import type { YardSettingsBodyInput } from '@/lib/validations/yard-settings';
import { fetchJson } from './fetch-json';
import type { WireOf } from './wire';

export const saveYardSettingsRequest = (body: YardSettingsBodyInput) =>
  fetchJson<{ settings: WireOf<typeof updateYardSettings> }>('/api/settings', {
    method: 'PATCH',
    body: JSON.stringify(body),
  });
