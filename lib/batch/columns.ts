// The batch template: one duty point a row. Quantities come as value + unit column pairs so a unit
// is never implied; the unit columns accept the same spellings as the API.
export type BatchColumn = { name: string; path: string; hint: string; example: { heater: string; compressor: string } };

const c = (name: string, path: string, hint: string, heater: string, compressor: string): BatchColumn => ({
  name,
  path,
  hint,
  example: { heater, compressor },
});

export const batchColumns: BatchColumn[] = [
  c('service', 'service', 'heater or compressor', 'heater', 'compressor'),
  c('title', 'meta.title', 'short description, 3-160 characters', 'Dryer air heater', 'Instrument air compressor'),
  c('equipment_tag', 'meta.equipmentTag', 'your tag, up to 60 characters', 'EH-101', 'K-201'),
  c(
    'gas',
    'gas',
    'preset (air, nitrogen, methane, humid-air, ...) or mixture like CH4:0.9;C2H6:0.05;N2:0.05',
    'air',
    'nitrogen',
  ),
  c('gas_basis', 'gas.basis', 'mole (default) or mass, for mixtures', '', ''),
  c('relative_humidity_percent', 'gas.relativeHumidityPercent', 'humid-air only', '', ''),
  c('flow_value', 'flow.value', 'number above 0', '2000', '1500'),
  c('flow_unit', 'flow.unit', 'kg/h, kg/s, t/h, lb/h, Nm3/h, Sm3/h, SCFM, MMSCFD, m3/h, ACFM', 'kg/h', 'Nm3/h'),
  c('inlet_temperature_value', 'inlet.temperature.value', 'number', '15', '20'),
  c('inlet_temperature_unit', 'inlet.temperature.unit', 'degC, degF, K, degR', 'degC', 'degC'),
  c('inlet_pressure_value', 'inlet.pressure.value', 'number', '3', '1'),
  c(
    'inlet_pressure_unit',
    'inlet.pressure.unit',
    'kPa, bar, MPa, psia (absolute) or kPag, barg, psig (gauge)',
    'barg',
    'bar',
  ),
  c('outlet_temperature_value', 'outletTemperature.value', 'heater only', '320', ''),
  c('outlet_temperature_unit', 'outletTemperature.unit', 'heater only', 'degC', ''),
  c('heat_loss_percent', 'heatLossPercent', 'heater only, 0-50', '5', ''),
  c('design_margin_percent', 'designMarginPercent', 'heater only, 0-100', '10', ''),
  c('discharge_pressure_value', 'dischargePressure.value', 'compressor only', '', '30'),
  c('discharge_pressure_unit', 'dischargePressure.unit', 'compressor only', '', 'bar'),
  c('stages', 'stages', 'compressor only, 1-6', '', '3'),
  c('isentropic_efficiency', 'isentropicEfficiency', 'fraction, e.g. 0.78 (or give polytropic)', '', '0.8'),
  c('polytropic_efficiency', 'polytropicEfficiency', 'fraction (or give isentropic)', '', ''),
  c(
    'intercooler_outlet_temperature_value',
    'intercoolerOutletTemperature.value',
    'compressor only; default suction temperature',
    '',
    '35',
  ),
  c('intercooler_outlet_temperature_unit', 'intercoolerOutletTemperature.unit', 'compressor only', '', 'degC'),
  c('supply_voltage_v', 'supply.voltageV', 'line voltage, e.g. 400', '400', ''),
  c('supply_phases', 'supply.phases', '1 or 3', '3', ''),
  c('method', 'method', 'compressor, ideal-gas methods: variable-cp (default) or constant-k', '', 'variable-cp'),
  c(
    'equation_of_state',
    'equationOfState',
    'gerg-2008, peng-robinson or ideal-gas; blank: GERG-2008 when it covers the gas, else Peng-Robinson',
    '',
    '',
  ),
  c('notes', 'meta.notes', 'free text', '', ''),
];

export const batchColumnNames = batchColumns.map((col) => col.name);

/** The CSV column a validation path belongs to: the longest column path that prefixes it. */
export function columnForPath(path: string): string {
  let best: BatchColumn | undefined;
  for (const col of batchColumns) {
    if ((path === col.path || path.startsWith(`${col.path}.`)) && (!best || col.path.length > best.path.length))
      best = col;
  }
  if (best) return best.name;
  const head = path.split('.')[0] ?? '';
  const byHead = batchColumns.find((col) => col.path.split('.')[0] === head);
  return byHead?.name ?? (path || 'row');
}
