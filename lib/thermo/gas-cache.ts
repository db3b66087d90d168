import { compileGas, type GasModel } from './gas-model';
import type { MoleFractions } from './composition';

// Batches repeat the same few gases; compiling costs far more than a lookup. Bounded so arbitrary
// user mixtures cannot grow memory without limit (cleared wholesale: simple, and rebuilt cheaply).
const MAX_ENTRIES = 1024;
const cache = new Map<string, GasModel>();

/** The compiled gas for `key`, compiling and remembering it on first use. */
export function cachedGas(key: string, label: string, moleFractions: MoleFractions): GasModel {
  const hit = cache.get(key);
  if (hit) return hit;
  if (cache.size >= MAX_ENTRIES) cache.clear();
  const gas = compileGas(key, label, moleFractions);
  cache.set(key, gas);
  return gas;
}
