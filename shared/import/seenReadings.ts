/**
 * Readings already accepted, looked up by time for duplicate and conflict checks. Logger files are
 * nearly always in time order, so readings that extend the series go to sorted typed arrays (binary
 * search, no per-entry objects); only readings that arrive out of order go to a Map. A Map alone for a
 * million rows cost more than the rest of the row handling together (measured).
 */
export class SeenReadings {
  /** Filled by find(): the earlier reading with the same time. */
  foundC = Number.NaN;
  foundRh = Number.NaN;
  foundLine = 0;

  private times = new Float64Array(4096);
  private values = new Float64Array(4096 * 3);
  private size = 0;
  private readonly outOfOrder = new Map<number, [c: number, rh: number, line: number]>();

  /** Looks for a reading at time t; on success the found* fields hold it. */
  find(t: number): boolean {
    if (this.size === 0 || t > this.times[this.size - 1]) return false;
    let low = 0;
    let high = this.size - 1;
    while (low <= high) {
      const middle = (low + high) >> 1;
      const at = this.times[middle];
      if (at === t) {
        this.foundC = this.values[middle * 3];
        this.foundRh = this.values[middle * 3 + 1];
        this.foundLine = this.values[middle * 3 + 2];
        return true;
      }
      if (at < t) low = middle + 1;
      else high = middle - 1;
    }
    const other = this.outOfOrder.get(t);
    if (other === undefined) return false;
    [this.foundC, this.foundRh, this.foundLine] = other;
    return true;
  }

  /** Adds a reading not found before; `rh` is NaN when there is none. */
  add(t: number, c: number, rh: number, line: number): void {
    if (this.size > 0 && t < this.times[this.size - 1]) {
      this.outOfOrder.set(t, [c, rh, line]);
      return;
    }
    if (this.size === this.times.length) this.grow();
    this.times[this.size] = t;
    this.values[this.size * 3] = c;
    this.values[this.size * 3 + 1] = rh;
    this.values[this.size * 3 + 2] = line;
    this.size++;
  }

  private grow(): void {
    const times = new Float64Array(this.times.length * 2);
    times.set(this.times);
    const values = new Float64Array(this.values.length * 2);
    values.set(this.values);
    this.times = times;
    this.values = values;
  }
}
