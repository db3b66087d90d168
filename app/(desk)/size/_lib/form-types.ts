/** A quantity as the form holds it: the text typed and the unit picked. */
export type QtyText = { value: string; unit: string };

export type MixtureRow = { species: string; fraction: string };

export type DeskService = 'heater' | 'compressor';

/**
 * Everything the sizing desk form holds. Both services' targets live side by side so switching service
 * keeps what was typed; `toRequest` picks the fields the engine reads for the chosen service.
 */
export type DeskValues = {
  service: DeskService;
  /** Customer account the sizing is for (signed-in users); sets the site barometric pressure. */
  accountId: string;
  site: { barometricPressure: QtyText };
  gas: {
    mode: 'preset' | 'mixture';
    preset: string;
    humidityBy: 'rh' | 'dew';
    relativeHumidityPercent: string;
    dewPoint: QtyText;
    basis: 'mole' | 'mass';
    components: MixtureRow[];
  };
  /** The property model: 'auto' lets the engine choose (GERG-2008 when it covers the gas, else Peng-Robinson). */
  equationOfState: 'auto' | 'gerg-2008' | 'peng-robinson' | 'ideal-gas';
  flow: QtyText;
  inlet: { temperature: QtyText; pressure: QtyText };
  outletTemperature: QtyText;
  heatLossPercent: string;
  designMarginPercent: string;
  supply: { voltageV: string; phases: '1' | '3' };
  /** Catalogue ratings, kW, separated by commas or spaces; blank for the default list. */
  heaterRatingsKw: string;
  dischargePressure: QtyText;
  stages: string;
  efficiencyKind: 'isentropic' | 'polytropic';
  efficiency: string;
  /** Blank: cooled back to the suction temperature. */
  intercoolerOutletTemperature: QtyText;
  interstagePressureDropPercent: string;
  mechanicalEfficiency: string;
  method: 'constant-k' | 'variable-cp';
  /** Blank: the engine's default (150 °C, 135 °C for hydrogen-rich gas). */
  dischargeTemperatureLimit: QtyText;
};

/** Paths of the quantity fields, with the kind of unit picker each carries. */
export const QUANTITY_FIELDS = {
  'site.barometricPressure': 'barometric',
  'gas.dewPoint': 'temperature',
  flow: 'flow',
  'inlet.temperature': 'temperature',
  'inlet.pressure': 'pressure',
  outletTemperature: 'temperature',
  dischargePressure: 'pressure',
  intercoolerOutletTemperature: 'temperature',
  dischargeTemperatureLimit: 'temperature',
} as const;

export type QuantityPath = keyof typeof QUANTITY_FIELDS;
export type FieldKind = (typeof QUANTITY_FIELDS)[QuantityPath];
