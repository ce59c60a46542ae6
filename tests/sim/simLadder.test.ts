import { describe, expect, it } from 'vitest';
import { simLadder } from '../../src/sim/simLadder.ts';
import { LEVEL_BAR, SIM_LEVELS } from '../../src/sim/levelTable.ts';
import { UsageError } from '../../src/errors/KindredError.ts';

describe('simLadder(minorLevels)', () => {
  it('is the default table by default', () => {
    const l = simLadder();
    expect(l.names).toEqual([...SIM_LEVELS]);
    expect(l.bar).toEqual([...LEVEL_BAR]);
    expect(l.top).toBe(5);
  });

  it('drops A+ for 4 minor levels and also Rk for 3, keeping each kept level its own constants', () => {
    expect(simLadder(4).names).toEqual(['Entry', 'Low', 'High', 'Elite', 'Top']);
    expect(simLadder(3).names).toEqual(['Low', 'High', 'Elite', 'Top']);
    expect(simLadder(3).bar).toEqual([LEVEL_BAR[1], LEVEL_BAR[3], LEVEL_BAR[4], LEVEL_BAR[5]]);
    expect(simLadder(3).top).toBe(3);
  });

  it('refuses other level counts', () => {
    expect(() => simLadder(2)).toThrow(UsageError);
    expect(() => simLadder(6)).toThrow(UsageError);
  });
});
