// The smallest yard most suites need, built through the lib functions: settings, one user per role
// (ids 1, 2, 3 in the order of AS in api.ts) and two sections with stock lengths. Prices and lengths
// are invented test values, not trade data.
import type { Db } from '@/db';
import { yardSettings } from '@/db/schema';
import { createSection } from '@/lib/stock/save-section';
import { createUser } from '@/lib/users/manage-users';
import { updateYardSettings } from '@/lib/yard/update-yard-settings';
import type { Fixture } from './test-db';

export const TEST_PASSWORD = 'test-password';

export const minimalYard: Fixture = async (db: Db) => {
  // The settings row is a singleton the demo seed creates; no lib verb inserts it.
  await db.insert(yardSettings).values({ id: 1, yardName: 'Test yard' });
  await updateYardSettings({
    body: {
      yardName: 'Test yard',
      kerfMm: 3,
      trimMm: 5,
      minOffcutMm: 300,
      displayUnit: 'mm',
      perCutChargePence: 25,
      clearOffcutsAfterDays: 90,
    },
  });
  for (const [email, name, role] of [
    ['owner@yard.test', 'Owner', 'owner'],
    ['hand@yard.test', 'Yard Hand', 'yard_hand'],
    ['saw@yard.test', 'Saw Operator', 'saw_operator'],
  ] as const) {
    await createUser({ email, name, role, password: TEST_PASSWORD });
  }
  const lengths = (pencePerMetre: number, unlimited: boolean) =>
    [3600, 4800, 6000].map((lengthMm) => ({
      lengthMm,
      pricePence: Math.round((pencePerMetre * lengthMm) / 1000),
      unlimited,
      active: true,
    }));
  await createSection({
    body: {
      code: 'T47X100',
      name: '47 × 100 test stud',
      thicknessMm: 47,
      widthMm: 100,
      species: 'Spruce',
      grade: 'C24',
      treatment: '',
      active: true,
      lengths: lengths(200, false),
    },
  });
  await createSection({
    body: {
      code: 'T22X100',
      name: '22 × 100 test board',
      thicknessMm: 22,
      widthMm: 100,
      species: 'Spruce',
      grade: '',
      treatment: '',
      active: true,
      lengths: lengths(90, true),
    },
  });
};
