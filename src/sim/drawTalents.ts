/**
 * Peak true talents of a new professional player, standard normal per
 * talent with a few built-in correlations (invented, plausible): fast
 * players tend to field better and hit for a little less power; power
 * trades a little contact; velocity, spin and stuff go together.
 * Each talent keeps unit variance: t = sum(w_i * z_i) with sum(w_i^2) = 1.
 *
 * @example
 * drawHitterTalents(new SeededRandom(3), new Float64Array(7)); // fills 7 talents, each ~N(0, 1)
 */
import type { SeededRandom } from '../random/SeededRandom.ts';
import {
  H_ARM, H_CONTACT, H_CTHROW, H_EYE, H_GLOVE, H_POWER, H_SPEED,
  P_CONTROL, P_GROUNDBALL, P_SPIN, P_STAMINA, P_STUFF, P_VELOCITY,
} from './talentNames.ts';

export function drawHitterTalents(rng: SeededRandom, out: Float64Array): Float64Array {
  const athletic = rng.normal();
  const power = rng.normal();
  out[H_POWER] = power;
  out[H_CONTACT] = -0.2 * power + Math.sqrt(1 - 0.04) * rng.normal();
  out[H_EYE] = 0.25 * power + Math.sqrt(1 - 0.0625) * rng.normal();
  out[H_SPEED] = 0.6 * athletic - 0.2 * power + Math.sqrt(1 - 0.36 - 0.04) * rng.normal();
  out[H_GLOVE] = 0.5 * athletic + Math.sqrt(1 - 0.25) * rng.normal();
  out[H_ARM] = 0.3 * athletic + Math.sqrt(1 - 0.09) * rng.normal();
  out[H_CTHROW] = 0.3 * athletic + Math.sqrt(1 - 0.09) * rng.normal();
  return out;
}

export function drawPitcherTalents(rng: SeededRandom, out: Float64Array): Float64Array {
  const velocity = rng.normal();
  const spin = 0.3 * velocity + Math.sqrt(1 - 0.09) * rng.normal();
  out[P_VELOCITY] = velocity;
  out[P_SPIN] = spin;
  out[P_STUFF] = 0.45 * velocity + 0.25 * spin + Math.sqrt(1 - 0.2025 - 0.0625) * rng.normal();
  out[P_CONTROL] = -0.1 * velocity + Math.sqrt(1 - 0.01) * rng.normal();
  out[P_GROUNDBALL] = rng.normal();
  out[P_STAMINA] = rng.normal();
  return out;
}
