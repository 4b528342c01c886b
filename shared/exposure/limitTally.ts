// Time and degree-hours beyond one limit, accumulated piece by piece along the joined line.
import type { LimitExposure } from './types';

export type LimitSide = 'below' | 'above';

export class LimitTally {
  hours = 0;
  degreeHours = 0;
  private readonly sign: number;

  constructor(
    readonly limitC: number,
    side: LimitSide,
  ) {
    this.sign = side === 'below' ? 1 : -1;
  }

  /**
   * Adds a straight piece running from c0 to c1 over `h` hours. With excess e(t) = L − T (below) or T − L
   * (above), linear in t, the time where e > 0 ends exactly at the crossing and the area is a triangle or
   * trapezoid — no sampling. "Strictly beyond": a piece lying exactly on the limit adds nothing.
   */
  addPiece(c0: number, c1: number, h: number): void {
    const e0 = this.sign * (this.limitC - c0);
    const e1 = this.sign * (this.limitC - c1);
    if (e0 <= 0 && e1 <= 0) return;
    if (e0 >= 0 && e1 >= 0) {
      this.hours += h;
      this.degreeHours += (h * (e0 + e1)) / 2;
      return;
    }
    const inside = Math.max(e0, e1);
    const fraction = inside / (inside - Math.min(e0, e1));
    this.hours += h * fraction;
    this.degreeHours += (h * fraction * inside) / 2;
  }

  toLimitExposure(): LimitExposure {
    return { limitC: this.limitC, hours: this.hours, degreeHours: this.degreeHours };
  }
}
