// Vitest runs projects one after another in name order, so a long suite of a late project runs at the
// end with the other core idle. Suites that spend most of their time waiting (on the queue's retry
// timers and worker processes) start first instead, while the other files keep both cores busy.
import { BaseSequencer, type TestSpecification } from 'vitest/node';

const waitingSuites = ['tests/server/solver-queue.test.ts'];

export class WaitingFirstSequencer extends BaseSequencer {
  override async sort(files: TestSpecification[]): Promise<TestSpecification[]> {
    const sorted = await super.sort(files);
    const waits = (file: TestSpecification) =>
      waitingSuites.some((suite) => file.moduleId.endsWith(`/${suite}`));
    return [...sorted.filter(waits), ...sorted.filter((file) => !waits(file))];
  }
}
