/**
 * Names of the latent true talents the simulator gives each kind of player.
 * Talents are on a standard-normal scale among professional players at their
 * peak (0 = a typical professional, +1 = one standard deviation better);
 * every talent is oriented so that higher is better.
 */
export const HITTER_TALENTS = [
  /** Bat-to-ball skill: fewer strikeouts, more hits on balls in play, more sweet-spot contact. */
  'contact',
  /** Raw power: home runs, extra bases, exit velocity, hard-hit rate, launch angle. */
  'power',
  /** Plate discipline: walks, fewer strikeouts. */
  'eye',
  /** Foot speed: run speed, steals, triples, range in the field. */
  'speed',
  /** Range and hands: chances taken and errors avoided. */
  'glove',
  /** Throwing strength: arm velocity, outfield assists, catcher pop time. */
  'arm',
  /** Catcher's catch-and-throw craft: exchange, pop time, runners caught (matters for catchers only). */
  'catcherThrow',
] as const;

export const PITCHER_TALENTS = [
  /** Swing-and-miss quality of the arsenal: strikeouts, whiffs, weak contact. */
  'stuff',
  /** Command of the zone: fewer walks. */
  'control',
  /** Groundball tendency: ground-ball rate, fewer home runs. */
  'groundball',
  /** Fastball velocity. */
  'velocity',
  /** Fastball spin. */
  'spin',
  /** Durability and length: innings per start, starter versus reliever. */
  'stamina',
] as const;

export type HitterTalent = (typeof HITTER_TALENTS)[number];
export type PitcherTalent = (typeof PITCHER_TALENTS)[number];
export type SimKind = 'hitter' | 'pitcher';

/** Talent names per kind, in the order of the truth vectors. */
export const TALENT_NAMES: Readonly<Record<SimKind, readonly string[]>> = {
  hitter: HITTER_TALENTS,
  pitcher: PITCHER_TALENTS,
};

/** Width of a stored truth vector (the longer of the two lists). */
export const MAX_TALENTS = Math.max(HITTER_TALENTS.length, PITCHER_TALENTS.length);

// Indices, so hot loops can read Float64Array slots by name.
export const H_CONTACT = 0;
export const H_POWER = 1;
export const H_EYE = 2;
export const H_SPEED = 3;
export const H_GLOVE = 4;
export const H_ARM = 5;
export const H_CTHROW = 6;
export const P_STUFF = 0;
export const P_CONTROL = 1;
export const P_GROUNDBALL = 2;
export const P_VELOCITY = 3;
export const P_SPIN = 4;
export const P_STAMINA = 5;
