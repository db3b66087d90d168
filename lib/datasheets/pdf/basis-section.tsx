/** @jsxRuntime automatic @jsxImportSource react */
import { EQUATION_NAMES } from '@/lib/engine';
import { formatKpa, unitLabel } from '../format';
import type { DatasheetSnapshot } from '../snapshot';
import { block, headingBlock, kvBlocks, type Block } from './blocks';
import { pdfKit } from './kit';
import { EXTRA_LINE_PT, linesIn, pct } from './measure';
import { styles } from './theme';

/** What the figures rest on: property data, conventions, flow bases and the barometric pressure. */
export function basisBlocks(s: DatasheetSnapshot): Block[] {
  const { Text } = pdfKit();
  const b = s.result.basis;
  const bases = b.reportedFlowBases.map((f) => `${unitLabel(f.unit)}: ${f.description}`).join('; ');
  const facts = kvBlocks(
    'bk',
    [
      [
        'Equation of state',
        `${EQUATION_NAMES[b.equationOfState ?? 'ideal-gas']}${b.equationOfStateReason ? ` (${b.equationOfStateReason})` : ''}`,
      ],
      ['Its source and range', b.equationOfStateSource ?? 'ideal gas (sized before real-gas properties were offered)'],
      ['Standard volumes', b.standardVolumeBasis ?? 'ideal gas: Z = 1 at every reference state'],
      ['Ideal-gas data', b.propertySource],
      [
        'Flow input basis',
        b.flowInputBasis
          ? `${unitLabel(b.flowInputBasis.unit)}: ${b.flowInputBasis.description}`
          : 'mass flow or actual volume flow entered; no standard basis applies',
      ],
      ['Standard flows reported', bases],
      [
        'Barometric pressure',
        `${formatKpa(b.barometricPressureKpa)} (${b.barometricPressureSource})`,
        'gauge pressures convert with this',
      ],
      [
        'Engine version',
        `${s.sizing.engineVersion} (sizing ${s.sizing.number}, saved ${s.sizing.createdAt.slice(0, 10)})`,
      ],
    ],
    { labelPct: 26, mono: false },
  );
  const conventions = b.conventions.map((c, i) =>
    block(
      `bc${i}`,
      1 + 4 + EXTRA_LINE_PT * linesIn(`- ${c}`, pct(100)),
      <Text style={{ marginBottom: 1 }}>{`- ${c}`}</Text>,
    ),
  );
  return [
    headingBlock('4', 'Method basis'),
    ...facts,
    block('bch', 16, <Text style={[styles.strong, { marginTop: 4, marginBottom: 1 }]}>Conventions</Text>, true),
    ...conventions,
  ];
}
