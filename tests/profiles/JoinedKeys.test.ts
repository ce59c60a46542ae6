import { describe, expect, it } from 'vitest';
import { JoinedKeys } from '../../src/profiles/JoinedKeys.ts';

describe('JoinedKeys', () => {
  it('joins two or three parts with | as a template string does (`${season}|${level}`, `${season}|${level}|${position}`)', () => {
    const keys = new JoinedKeys();
    expect(keys.of(2025, 'AA')).toBe('2025|AA');
    expect(keys.of('AA', 'IF')).toBe('AA|IF');
    expect(keys.of3(2025, 'AA', 'SS')).toBe('2025|AA|SS');
  });

  it('tells apart parts that differ, and a number from the same digits after another level', () => {
    const keys = new JoinedKeys();
    const made = [keys.of(2025, 'AA'), keys.of(2024, 'AA'), keys.of(2025, 'Top'), keys.of('2025', 'AA'), keys.of3(2025, 'AA', 'C'), keys.of3(2025, 'AA', 'SS')];
    expect(made).toEqual(['2025|AA', '2024|AA', '2025|Top', '2025|AA', '2025|AA|C', '2025|AA|SS']);
  });

  it('gives back the same key for the same parts, however often asked', () => {
    const keys = new JoinedKeys();
    const first = keys.of3(2025, 'AA', 'SS');
    for (let i = 0; i < 3; i++) expect(keys.of3(2025, 'AA', 'SS')).toBe(first);
    expect(keys.of(2025, 'AA')).toBe(keys.of(2025, 'AA'));
  });
});
