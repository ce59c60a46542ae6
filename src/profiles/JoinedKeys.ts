/**
 * Keys joined with '|' from two or three parts (`${a}|${b}`, `${a}|${b}|${c}`), one string per distinct
 * parts. The profiles key every line by its league or standardisation stratum, and a million lines share
 * a few thousand strata: one string per stratum (its hash computed once, by every map it keys) instead
 * of one new string per line.
 *
 * @example
 * const keys = new JoinedKeys();
 * keys.of(2025, 'AA') === keys.of(2025, 'AA'); // true, and the key is '2025|AA'
 * keys.of3(2025, 'AA', 'SS'); // '2025|AA|SS'
 */
export class JoinedKeys {
  readonly #two = new Map<string | number, Map<string, string>>();
  readonly #three = new Map<string | number, Map<string, Map<string, string>>>();

  of(a: string | number, b: string): string {
    let byB = this.#two.get(a);
    if (!byB) this.#two.set(a, (byB = new Map()));
    let key = byB.get(b);
    if (key === undefined) byB.set(b, (key = `${a}|${b}`));
    return key;
  }

  of3(a: string | number, b: string, c: string): string {
    let byB = this.#three.get(a);
    if (!byB) this.#three.set(a, (byB = new Map()));
    let byC = byB.get(b);
    if (!byC) byB.set(b, (byC = new Map()));
    let key = byC.get(c);
    if (key === undefined) byC.set(c, (key = `${a}|${b}|${c}`));
    return key;
  }
}
