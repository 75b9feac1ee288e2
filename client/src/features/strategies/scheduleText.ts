import type { Schedule } from '../../../../models/scenario/types';

/** A schedule in words, as the timeline and the announcements say it. */
export function describeSchedule(schedule: Schedule | null): string {
  if (schedule === null) return 'schedule needs a fix';
  switch (schedule.kind) {
    case 'every-year':
      return 'every year';
    case 'every-k-years':
      return schedule.k === 1
        ? `every year from year ${schedule.start}`
        : `every ${schedule.k} years from year ${schedule.start}`;
    case 'year-range':
      return schedule.first === schedule.last
        ? `year ${schedule.first} only`
        : `years ${schedule.first}–${schedule.last}`;
  }
}
