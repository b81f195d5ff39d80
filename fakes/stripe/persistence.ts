import { existsSync, mkdirSync, readFileSync, renameSync, writeFileSync } from "node:fs";
import path from "node:path";
import { emptyState, type FakeState } from "./types";

/** Optional JSON-file persistence so restarting `npm start` keeps sessions and events. */
export class StatePersistence {
  private pending: NodeJS.Immediate | null = null;

  constructor(private readonly file: string | null) {}

  load(): FakeState {
    if (!this.file || !existsSync(this.file)) return emptyState();
    try {
      const parsed = JSON.parse(readFileSync(this.file, "utf8")) as Partial<FakeState>;
      return { ...emptyState(), ...parsed };
    } catch (err) {
      console.warn(`[stripe-fake] ignoring unreadable state file ${this.file}: ${String(err)}`);
      return emptyState();
    }
  }

  /** Coalesces the many mutations of one request into one write. */
  scheduleSave(getState: () => FakeState): void {
    if (!this.file || this.pending) return;
    this.pending = setImmediate(() => {
      this.pending = null;
      this.write(getState());
    });
  }

  flush(state: FakeState): void {
    if (!this.file) return;
    if (this.pending) clearImmediate(this.pending);
    this.pending = null;
    this.write(state);
  }

  private write(state: FakeState): void {
    if (!this.file) return;
    mkdirSync(path.dirname(this.file), { recursive: true });
    const tmp = `${this.file}.${process.pid}.tmp`;
    writeFileSync(tmp, JSON.stringify(state));
    renameSync(tmp, this.file);
  }
}
