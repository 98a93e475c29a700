/**
 * Days from 1970-01-01 to a date of the proleptic Gregorian calendar (month 1–12), by Howard
 * Hinnant's "days_from_civil" (chrono-Compatible Low-Level Date Algorithms): plain arithmetic,
 * cheaper per cell than Date.UTC, and right for every year (Date.UTC reads years 0–99 as 19xx).
 */
export function daysFromCivil(year: number, month: number, day: number): number {
  const y = month <= 2 ? year - 1 : year;
  const era = Math.floor(y / 400);
  const yearOfEra = y - era * 400;
  const dayOfYear = Math.floor((153 * (month > 2 ? month - 3 : month + 9) + 2) / 5) + day - 1;
  const dayOfEra = yearOfEra * 365 + Math.floor(yearOfEra / 4) - Math.floor(yearOfEra / 100) + dayOfYear;
  return era * 146_097 + dayOfEra - 719_468;
}
