import type { StoredGroup } from '../store/ProfileStore.ts';
import { fitCoreImputer, type CoreImputer } from './fitCoreImputer.ts';

/** The imputation lines of a group's profiles (fitCoreImputer), fitted on first use and kept as long as the group. */
export function coreImputerOf(g: Pick<StoredGroup, 'z' | 'n' | 'd'>): CoreImputer {
  let imputer = FITTED.get(g);
  if (!imputer) FITTED.set(g, (imputer = fitCoreImputer(g.z, g.n, g.d)));
  return imputer;
}

const FITTED = new WeakMap<object, CoreImputer>();
