import { describe, expect, it } from 'vitest';
import { KindredError } from '../../src/errors/KindredError.ts';
import { ageOnJune30 } from '../../src/stats/ageOnJune30.ts';

// Reference: common practice, baseball season age is the age on June 30 of the season;
// values worked by hand from the calendar.
describe('ageOnJune30(birthDate, season)', () => {
  it('gives the doc example: born 1998-07-01 is 25 in 2024, born 1998-06-30 is 26', () => {
    expect(ageOnJune30('1998-07-01', 2024)).toBe(25);
    expect(ageOnJune30('1998-06-30', 2024)).toBe(26);
  });
  it('counts a June 30 birthday as already reached and a July 1 birthday as not', () => {
    expect(ageOnJune30('2001-06-30', 2022)).toBe(21);
    expect(ageOnJune30('2001-07-01', 2022)).toBe(20);
    expect(ageOnJune30('2001-06-29', 2022)).toBe(21);
    expect(ageOnJune30('2001-12-31', 2022)).toBe(20);
    expect(ageOnJune30('2001-01-01', 2022)).toBe(21);
  });
  it('handles leap-day birthdays in leap and common seasons', () => {
    expect(ageOnJune30('2000-02-29', 2024)).toBe(24); // leap season
    expect(ageOnJune30('2000-02-29', 2023)).toBe(23); // common season: Feb 28/Mar 1 both precede June 30
  });
  it('rejects dates that are not on the calendar or not YYYY-MM-DD', () => {
    for (const bad of ['2001-02-29', '1900-02-29', '2001-13-01', '2001-04-31', '2001-6-30', '30/06/2001', '']) {
      expect(() => ageOnJune30(bad, 2022), bad).toThrow(KindredError);
    }
    expect(ageOnJune30('1600-02-29', 1620)).toBe(20); // 1600 is a leap year (divisible by 400)
  });
  it('names the bad value and the code in the error', () => {
    try {
      ageOnJune30('2001-02-30', 2022);
      expect.unreachable();
    } catch (e) {
      expect(e).toBeInstanceOf(KindredError);
      if (e instanceof KindredError) {
        expect(e.code).toBe('kindred.input.badDate');
        expect(e.message).toContain('"2001-02-30"');
      }
    }
  });
  it('rejects a season that is not an integer', () => {
    expect(() => ageOnJune30('2001-01-01', 2022.5)).toThrow(/expected an integer year/);
  });
});
