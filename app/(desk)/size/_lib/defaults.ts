import type { UnitSystem } from '@/lib/units';
import type { DeskValues } from './form-types';

// Starting figures for a new enquiry: an ordinary plant-air duty that sizes straight away, in round
// numbers of each system [cp]. Heat loss 5 % and margin 10 % sit inside the usual 2-10 % and 10-25 %.
const SI: DeskValues = {
  service: 'heater',
  accountId: '',
  site: { barometricPressure: { value: '101.325', unit: 'kPa' } },
  gas: {
    mode: 'preset',
    preset: 'air',
    humidityBy: 'rh',
    relativeHumidityPercent: '60',
    dewPoint: { value: '10', unit: 'degC' },
    basis: 'mole',
    components: [
      { species: 'CH4', fraction: '0.9' },
      { species: 'C2H6', fraction: '0.05' },
      { species: 'N2', fraction: '0.05' },
    ],
  },
  flow: { value: '1000', unit: 'kg/h' },
  inlet: { temperature: { value: '20', unit: 'degC' }, pressure: { value: '1', unit: 'barg' } },
  outletTemperature: { value: '250', unit: 'degC' },
  equationOfState: 'auto',
  heatLossPercent: '5',
  designMarginPercent: '10',
  supply: { voltageV: '400', phases: '3' },
  heaterRatingsKw: '',
  dischargePressure: { value: '7', unit: 'barg' },
  stages: '2',
  efficiencyKind: 'isentropic',
  efficiency: '0.78',
  intercoolerOutletTemperature: { value: '35', unit: 'degC' },
  interstagePressureDropPercent: '1',
  mechanicalEfficiency: '0.98',
  method: 'variable-cp',
  dischargeTemperatureLimit: { value: '', unit: 'degC' },
};

const US: DeskValues = {
  ...SI,
  site: { barometricPressure: { value: '14.696', unit: 'psia' } },
  gas: { ...SI.gas, dewPoint: { value: '50', unit: 'degF' } },
  flow: { value: '2000', unit: 'lb/h' },
  inlet: { temperature: { value: '70', unit: 'degF' }, pressure: { value: '15', unit: 'psig' } },
  outletTemperature: { value: '480', unit: 'degF' },
  supply: { voltageV: '480', phases: '3' },
  dischargePressure: { value: '100', unit: 'psig' },
  intercoolerOutletTemperature: { value: '95', unit: 'degF' },
  dischargeTemperatureLimit: { value: '', unit: 'degF' },
};

/** A fresh form in the user's unit system (copies, so callers may mutate). */
export function defaultValues(system: UnitSystem): DeskValues {
  return structuredClone(system === 'us' ? US : SI);
}
