/** Entries per block: blocks are filled in turn and never copied (a doubling array copied and re-faulted ~2× the memory). */
const BLOCK = 1 << 16;

/**
 * Readings already accepted, looked up by time for duplicate and conflict checks. Logger files are
 * nearly always in time order, oldest or newest first, so readings that extend the series in the file's
 * direction (set by its first two readings) go to sorted typed-array blocks, keyed by the time or its
 * negative so that the keys always increase (binary search, no per-entry objects); only readings that
 * arrive out of order go to a Map. A Map alone for a million rows cost more than the rest of the row
 * handling together, and held some 100 MB (measured).
 * Per entry: time and °C as doubles, the line as a 32-bit integer (a file with 2^32 lines would be
 * at least 8 GiB), and humidity only in blocks that hold some (20 instead of 32 bytes without it).
 */
export class SeenReadings {
  /** Filled by find(): the earlier reading with the same time. */
  foundC = Number.NaN;
  foundRh = Number.NaN;
  foundLine = 0;

  private readonly timeBlocks: Float64Array[] = [];
  private readonly celsiusBlocks: Float64Array[] = [];
  private readonly lineBlocks: Uint32Array[] = [];
  /** Null for a block whose entries have no humidity (NaN throughout). */
  private readonly humidityBlocks: (Float64Array | null)[] = [];
  private size = 0;
  /** The key of the last in-order entry; keys are sign × time. */
  private latestKey = -Infinity;
  /** +1 for oldest-first files, −1 for newest-first; decided by the second reading. */
  private sign = 1;
  private readonly outOfOrder = new Map<number, [c: number, rh: number, line: number]>();

  /** Looks for a reading at time t; on success the found* fields hold it. */
  find(t: number): boolean {
    const key = this.sign * t;
    if (key > this.latestKey) return false;
    const index = this.indexOf(key);
    if (index >= 0) {
      const block = Math.floor(index / BLOCK);
      const at = index % BLOCK;
      const humidity = this.humidityBlocks[block];
      this.foundC = this.celsiusBlocks[block][at];
      this.foundRh = humidity === null ? Number.NaN : humidity[at];
      this.foundLine = this.lineBlocks[block][at];
      return true;
    }
    const other = this.outOfOrder.get(t);
    if (other === undefined) return false;
    [this.foundC, this.foundRh, this.foundLine] = other;
    return true;
  }

  /** Adds a reading not found before; `rh` is NaN when there is none. */
  add(t: number, c: number, rh: number, line: number): void {
    if (this.size === 1 && this.sign * t < this.latestKey) {
      // The second reading is older than the first: a newest-first file. Keys become negated times.
      this.sign = -1;
      this.timeBlocks[0][0] = -this.timeBlocks[0][0];
      this.latestKey = this.timeBlocks[0][0];
    }
    const key = this.sign * t;
    if (key < this.latestKey) {
      this.outOfOrder.set(t, [c, rh, line]);
      return;
    }
    const at = this.size % BLOCK;
    if (at === 0) {
      this.timeBlocks.push(new Float64Array(BLOCK));
      this.celsiusBlocks.push(new Float64Array(BLOCK));
      this.lineBlocks.push(new Uint32Array(BLOCK));
      this.humidityBlocks.push(null);
    }
    const block = this.timeBlocks.length - 1;
    this.timeBlocks[block][at] = key;
    this.celsiusBlocks[block][at] = c;
    this.lineBlocks[block][at] = line;
    // Slots start as NaN and are written once, so only a reading with humidity needs storing.
    if (!Number.isNaN(rh)) (this.humidityBlocks[block] ??= new Float64Array(BLOCK).fill(Number.NaN))[at] = rh;
    this.size++;
    this.latestKey = key;
  }

  /** Binary search over the in-order entries' keys; -1 when the key is not among them. */
  private indexOf(key: number): number {
    let low = 0;
    let high = this.size - 1;
    while (low <= high) {
      const middle = (low + high) >> 1;
      const at = this.timeBlocks[Math.floor(middle / BLOCK)][middle % BLOCK];
      if (at === key) return middle;
      if (at < key) low = middle + 1;
      else high = middle - 1;
    }
    return -1;
  }
}
