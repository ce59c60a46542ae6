/**
 * The logistic function and its inverse (the logit), used to move a base
 * rate by talent on the log-odds scale so that rates stay inside 0..1.
 *
 * @example
 * logistic(logit(0.22)); // => 0.22
 * logistic(0); // => 0.5
 */
export function logistic(x: number): number {
  return 1 / (1 + Math.exp(-x));
}

export function logit(p: number): number {
  return Math.log(p / (1 - p));
}
