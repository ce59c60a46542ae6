/** Server texts in the page's words: no option flags, no commands, no error codes. Expected texts written by hand. */
import { describe, expect, it } from 'vitest';
import { ApiError } from '../../src/web/api.ts';
import { inPageWords, pageMessage } from '../../src/web/pageMessage.ts';

describe('inPageWords', () => {
  it('names an option by its field\'s label and leaves out a bracketed hint about a command', () => {
    expect(inPageWords('calibration not applied: the backtest used --horizon 6')).toBe('calibration not applied: the backtest used "Follow-up" 6');
    expect(inPageWords('no backtest stored with this store (kindred build stores one; kindred backtest runs one)')).toBe('no backtest stored with this store');
    expect(inPageWords('the backtest matched single seasons (no --path)')).toBe('the backtest matched single seasons (no "Seasons matched")');
  });
  it('leaves a text without flags or commands as it is', () => {
    expect(inPageWords('on this roster, too few hitter forecasts with a known follow-up to calibrate')).toBe('on this roster, too few hitter forecasts with a known follow-up to calibrate');
  });
});

describe('pageMessage', () => {
  it('says a refused parameter by its field\'s label, without the code (its doc example)', () => {
    expect(pageMessage(new ApiError(400, 'kindred.usage.badOption', 'parameter k: expected a whole number of 1 or more, got "0"', 'k'))).toBe('Comps (k): expected a whole number of 1 or more, got "0"');
  });
  it('turns a flag inside a message into the field\'s label', () => {
    const text = pageMessage(new ApiError(400, 'kindred.usage.badOption', 'leaves the pool empty: widen --level-span or tick more levels'));
    expect(text).toBe('Leaves the pool empty: widen "Levels around his" or tick more levels');
    expect(text).not.toMatch(/--|kindred\./);
  });
});
