/** Store folder used when --store is not given. */
export const DEFAULT_STORE = '.kindred-store';
