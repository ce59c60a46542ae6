import { KindredError } from '../errors/KindredError.ts';

const DATE_PATTERN = /^(\d{4})-(\d{2})-(\d{2})$/;
/** The season-age reference day: June 30. */
const REFERENCE_MONTH = 6;
const REFERENCE_DAY = 30;

function isLeapYear(year: number): boolean {
  return (year % 4 === 0 && year % 100 !== 0) || year % 400 === 0;
}

function daysInMonth(year: number, month: number): number {
  const days = [31, isLeapYear(year) ? 29 : 28, 31, 30, 31, 30, 31, 31, 30, 31, 30, 31];
  return days[month - 1] ?? 0;
}

/**
 * Season age: a player's age in whole years on June 30 of the season.
 *
 * Source: common practice (baseball season age is taken on June 30). A player born on June 30 has
 * already turned that age; one born on July 1 has not. A February 29 birthday falls before June 30
 * in every year, so it needs no special case.
 * Units: whole years; neither better nor worse.
 * Throws KindredError `kindred.input.badDate` when `birthDate` is not a real calendar date written
 * YYYY-MM-DD, or `kindred.input.notInteger` when `season` is not an integer (both are caller mistakes:
 * ingest has already checked the data).
 *
 * @param birthDate birth date, 'YYYY-MM-DD'
 * @param season season year
 * @example
 * ageOnJune30('1998-07-01', 2024); // => 25
 * ageOnJune30('1998-06-30', 2024); // => 26
 */
export function ageOnJune30(birthDate: string, season: number): number {
  if (!Number.isInteger(season)) {
    throw new KindredError('kindred.input.notInteger', `season ${String(season)}: expected an integer year`, {
      value: String(season),
    });
  }
  const match = DATE_PATTERN.exec(birthDate);
  const year = Number(match?.[1]);
  const month = Number(match?.[2]);
  const day = Number(match?.[3]);
  if (!match || month < 1 || month > 12 || day < 1 || day > daysInMonth(year, month)) {
    throw new KindredError(
      'kindred.input.badDate',
      `birth date ${JSON.stringify(birthDate)}: expected a real calendar date as YYYY-MM-DD`,
      { value: birthDate },
    );
  }
  const hadBirthday = month < REFERENCE_MONTH || (month === REFERENCE_MONTH && day <= REFERENCE_DAY);
  return season - year - (hadBirthday ? 0 : 1);
}
