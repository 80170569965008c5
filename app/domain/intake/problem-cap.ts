// Keeps an intake's problems under a cap: past it, reading stops and one summary says what went wrong most.
import { fileProblem, type IntakeProblem } from "./problems";

/** Problems an intake lists; a file with more is refused with a summary (a broken file must not store millions). */
export const MAX_PROBLEMS = 1000;
const SUMMARY_TOP = 3;

export class ProblemCollector {
  private readonly problems: IntakeProblem[];
  private readonly tally = new Map<string, { column: string | null; message: string; count: number }>();
  /** The row at which reading stopped, or null. */
  stoppedAt: number | null = null;

  constructor(initial: readonly IntakeProblem[]) {
    this.problems = [...initial];
  }

  add(row: number | null, problems: readonly IntakeProblem[]): void {
    for (const problem of problems) {
      const key = `${problem.column ?? ""}\u0000${problem.message}`;
      const seen = this.tally.get(key);
      if (seen) seen.count += 1;
      else this.tally.set(key, { column: problem.column, message: problem.message, count: 1 });
    }
    if (this.problems.length + problems.length <= MAX_PROBLEMS) {
      this.problems.push(...problems);
      return;
    }
    this.problems.push(...problems.slice(0, MAX_PROBLEMS - this.problems.length));
    this.stoppedAt = row;
  }

  withinCap(): boolean {
    return this.stoppedAt === null;
  }

  list(): IntakeProblem[] {
    return this.stoppedAt === null ? this.problems : [...this.problems, fileProblem(this.summary())];
  }

  private summary(): string {
    const top = [...this.tally.values()]
      .sort((a, b) => b.count - a.count)
      .slice(0, SUMMARY_TOP)
      .map((t) => `${t.column ? `${t.column}: ` : ""}${t.message} (${t.count} ${t.count === 1 ? "time" : "times"})`);
    return `More than ${MAX_PROBLEMS} problems: reading stopped at row ${this.stoppedAt}, and nothing from this file can be committed. Most frequent: ${top.join("; ")}. Fix these in the file and upload it again.`;
  }
}
