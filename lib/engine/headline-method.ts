import type { EquationOfStateId } from '../thermo/eos/types';
import type { CompressionMethodResult, CompressorBlock } from './result-types';

/** The method the compressor's headline figures come from: real gas whenever it was computed. */
export function headlineMethod(c: CompressorBlock): CompressionMethodResult {
  if (c.basis === 'real-gas' && c.realGas) return c.realGas;
  return c.basis === 'constant-k' ? c.constantK : c.variableCp;
}

/** Names of the compression methods as Dutywise shows them. */
export const METHOD_NAMES: Readonly<Record<CompressorBlock['basis'], string>> = {
  'constant-k': 'constant k',
  'variable-cp': 'variable cp',
  'real-gas': 'real gas',
};

/** Names of the equations of state as Dutywise shows them. */
export const EQUATION_NAMES: Readonly<Record<EquationOfStateId, string>> = {
  'gerg-2008': 'GERG-2008',
  'peng-robinson': 'Peng-Robinson',
  'ideal-gas': 'ideal gas',
};
