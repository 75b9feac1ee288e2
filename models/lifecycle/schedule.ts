// Whether a step's schedule applies it in a given year (years count 1..horizon).
import type { Schedule } from '../scenario/types';

export function isScheduled(schedule: Schedule, year: number): boolean {
  switch (schedule.kind) {
    case 'every-year':
      return true;
    case 'every-k-years':
      return year >= schedule.start && (year - schedule.start) % schedule.k === 0;
    case 'year-range':
      return year >= schedule.first && year <= schedule.last;
  }
}
