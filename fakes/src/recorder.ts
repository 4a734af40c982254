/**
 * What every fake keeps: the items it received, in order, and promises waiting for one that
 * matches (already received or still to come).
 */
export class Recorder<T> {
  readonly items: T[] = [];
  private readonly waiters: Array<{ match: (item: T) => boolean; resolve: (item: T) => void }> = [];

  constructor(private readonly what: string) {}

  add(item: T): void {
    this.items.push(item);
    for (const w of [...this.waiters]) {
      if (w.match(item)) {
        this.waiters.splice(this.waiters.indexOf(w), 1);
        w.resolve(item);
      }
    }
  }

  waitFor(match: (item: T) => boolean, timeoutMs: number): Promise<T> {
    const found = this.items.find(match);
    if (found) return Promise.resolve(found);
    return new Promise((resolve, reject) => {
      const w = { match, resolve };
      this.waiters.push(w);
      setTimeout(() => {
        const i = this.waiters.indexOf(w);
        if (i >= 0) {
          this.waiters.splice(i, 1);
          reject(new Error(`no matching ${this.what} within ${timeoutMs} ms (${this.items.length} received)`));
        }
      }, timeoutMs).unref();
    });
  }
}
