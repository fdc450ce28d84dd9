// Stopping rules. The search path is fixed by iteration caps, so the same job gives the same plan;
// the wall clock (timeLimitMs) is only a safety stop, and a plan that hit it says so.

export class SearchBudget {
  private readonly deadline: number;
  private readonly now: () => number;
  timedOut = false;

  constructor(timeLimitMs: number, now: () => number = () => performance.now()) {
    this.now = now;
    // Stop the search a little early so building the plan still fits inside the limit.
    this.deadline = now() + timeLimitMs * 0.9;
  }

  expired(): boolean {
    if (!this.timedOut && this.now() > this.deadline) this.timedOut = true;
    return this.timedOut;
  }

  remainingMs(): number {
    return Math.max(0, this.deadline - this.now());
  }

  readonly shouldStop = (): boolean => this.expired();
}
