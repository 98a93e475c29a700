const HOUR_MS = 3_600_000;
const DAY_MS = 86_400_000;

/** Mean demand in one cell of the week: arrivals seen there, hours observed there, their ratio. */
export interface ProfileCell {
  arrivals: number;
  hoursObserved: number;
  /** Arrivals per hour; 0 where nothing was observed (see hoursObserved). */
  ratePerHour: number;
}

/** Demand by hour of day (0–23), by weekday (0 = Sunday … 6 = Saturday, as Date#getDay) and both. */
export interface DemandProfile {
  byHour: (ProfileCell & { hour: number })[];
  byWeekday: (ProfileCell & { weekday: number })[];
  /** 168 cells, weekday-major: index = weekday·24 + hour. */
  byWeekdayHour: (ProfileCell & { weekday: number; hour: number })[];
}

/** Accumulates counts and exposure per hour of the week from local wall-clock intervals. */
export function createProfileBuilder(intervalMinutes: number) {
  const arrivals = new Float64Array(168);
  const hours = new Float64Array(168);
  const intervalMs = intervalMinutes * 60_000;
  const cellOf = (localMs: number): number => {
    const day = Math.floor(localMs / DAY_MS);
    const weekday = (((day + 4) % 7) + 7) % 7; // 1 Jan 1970 was a Thursday
    return weekday * 24 + Math.floor((localMs - day * DAY_MS) / HOUR_MS);
  };
  return {
    /** Adds one observed interval starting at local time `localStart` with `count` arrivals. */
    add(localStart: number, count: number): void {
      if (intervalMs <= HOUR_MS) {
        const cell = cellOf(localStart);
        arrivals[cell] += count;
        hours[cell] += intervalMinutes / 60;
        return;
      }
      // Longer intervals: their count is spread evenly over the hours they cover (an assumption).
      const n = intervalMs / HOUR_MS;
      for (let h = 0; h < n; h++) {
        const cell = cellOf(localStart + h * HOUR_MS);
        arrivals[cell] += count / n;
        hours[cell] += 1;
      }
    },
    build(): DemandProfile {
      const cell = (a: number, h: number): ProfileCell => ({ arrivals: a, hoursObserved: h, ratePerHour: h > 0 ? a / h : 0 });
      const byWeekdayHour = Array.from({ length: 168 }, (_, i) => ({ weekday: Math.floor(i / 24), hour: i % 24, ...cell(arrivals[i], hours[i]) }));
      const sum = (pick: (i: number) => boolean, arr: Float64Array): number => arr.reduce((s, v, i) => (pick(i) ? s + v : s), 0);
      const byHour = Array.from({ length: 24 }, (_, h) => ({
        hour: h,
        ...cell(sum((i) => i % 24 === h, arrivals), sum((i) => i % 24 === h, hours)),
      }));
      const byWeekday = Array.from({ length: 7 }, (_, d) => ({
        weekday: d,
        ...cell(sum((i) => Math.floor(i / 24) === d, arrivals), sum((i) => Math.floor(i / 24) === d, hours)),
      }));
      return { byHour, byWeekday, byWeekdayHour };
    },
  };
}
