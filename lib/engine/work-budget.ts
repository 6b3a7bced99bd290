/**
 * A deterministic cap on search work: callers spend steps (one free-rectangle test, one bin scanned)
 * and stop starting new work when the budget is spent. Counting steps instead of reading a clock
 * gives the same result on every machine and every run.
 */
export class WorkBudget {
  private used = 0;

  constructor(readonly limit: number) {}

  /** Charge `n` steps; false once the budget is spent. */
  spend(n: number): boolean {
    this.used += n;
    return this.used <= this.limit;
  }

  get spent(): number {
    return this.used;
  }

  get exhausted(): boolean {
    return this.used >= this.limit;
  }

  /** Fraction spent, 0..1. */
  get fraction(): number {
    return this.limit > 0 ? Math.min(1, this.used / this.limit) : 1;
  }
}
