import type { HeaterBlock } from '@/lib/engine';
import type { UnitSystem } from '@/lib/units';
import { fixed, showCp, showTemperature } from './quantity-format';

/** cp, cv and k at the inlet, mean and outlet temperatures. */
export function PropertiesTable({ h, system }: { h: HeaterBlock; system: UnitSystem }) {
  const cpUnit = showCp(1000, system).unit;
  const points = [
    ['Inlet', h.properties.inlet],
    ['Mean', h.properties.mean],
    ['Outlet', h.properties.outlet],
  ] as const;
  return (
    <table className="w-full text-sm" data-testid="properties-table">
      <caption className="mb-1 text-left text-label uppercase tracking-wide text-ink-muted">Gas properties</caption>
      <thead>
        <tr className="text-right text-label text-ink-soft">
          <th scope="col" className="py-1 text-left font-medium">
            Point
          </th>
          <th scope="col" className="py-1 font-medium">
            T, {showTemperature(0, system).unit}
          </th>
          <th scope="col" className="py-1 font-medium">
            cp, {cpUnit}
          </th>
          <th scope="col" className="py-1 font-medium">
            cv, {cpUnit}
          </th>
          <th scope="col" className="py-1 font-medium">
            k
          </th>
        </tr>
      </thead>
      <tbody className="font-mono tabular">
        {points.map(([label, p]) => (
          <tr key={label} className="border-t border-paper-line text-right">
            <th scope="row" className="py-1.5 text-left font-sans font-normal text-ink-soft">
              {label}
            </th>
            <td className="py-1.5">{showTemperature(p.temperatureC, system).value}</td>
            <td className="py-1.5">{showCp(p.cpJPerKgK, system).value}</td>
            <td className="py-1.5">{showCp(p.cvJPerKgK, system).value}</td>
            <td className="py-1.5">{fixed(p.k, 4)}</td>
          </tr>
        ))}
      </tbody>
    </table>
  );
}
