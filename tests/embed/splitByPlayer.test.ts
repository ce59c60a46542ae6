import { describe, expect, it } from 'vitest';
import { splitByPlayer } from '../../src/embed/splitByPlayer.ts';

// Invented player ids with 1 to 5 seasons each.
const groups: string[] = [];
for (let p = 0; p < 200; p++) for (let s = 0; s <= p % 5; s++) groups.push(`player${p}`);

describe('splitByPlayer', () => {
  it('splitByPlayer(groups, f, seed) never puts a player on both sides and covers every row once', () => {
    const { train, val } = splitByPlayer(groups, 0.2, 7);
    const trainPlayers = new Set(Array.from(train, (i) => groups[i]));
    const valPlayers = new Set(Array.from(val, (i) => groups[i]));
    for (const p of valPlayers) expect(trainPlayers.has(p)).toBe(false);
    expect(train.length + val.length).toBe(groups.length);
    expect(new Set([...train, ...val]).size).toBe(groups.length);
  });

  it('holds out about the requested share of rows, and is deterministic for a seed', () => {
    const a = splitByPlayer(groups, 0.2, 7);
    expect(a.val.length / groups.length).toBeGreaterThanOrEqual(0.2);
    expect(a.val.length / groups.length).toBeLessThan(0.22);
    expect(splitByPlayer(groups, 0.2, 7)).toEqual(a);
    expect(splitByPlayer(groups, 0.2, 8).val).not.toEqual(a.val);
  });

  it('does not depend on row order, only on the players', () => {
    const reversed = [...groups].reverse();
    const a = splitByPlayer(groups, 0.3, 3);
    const b = splitByPlayer(reversed, 0.3, 3);
    const playersA = new Set(Array.from(a.val, (i) => groups[i]));
    const playersB = new Set(Array.from(b.val, (i) => reversed[i]));
    expect(playersB).toEqual(playersA);
  });

  it('keeps at least one player on each side, and valFraction 0 trains on everything', () => {
    const two = splitByPlayer(['a', 'a', 'b'], 0.9, 1);
    expect(two.train.length).toBeGreaterThan(0);
    expect(two.val.length).toBeGreaterThan(0);
    expect(splitByPlayer(groups, 0, 1).val.length).toBe(0);
  });
});
