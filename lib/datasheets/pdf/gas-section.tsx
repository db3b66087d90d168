/** @jsxRuntime automatic @jsxImportSource react */
import { Fragment } from 'react';
import { formatFigure, formatFixed } from '../format';
import type { DatasheetSnapshot } from '../snapshot';
import { block, headingBlock, kvBlocks, tableBlocks, type Block } from './blocks';
import { pdfKit } from './kit';
import { linesIn, pct } from './measure';
import { styles } from './theme';

const sum = (bs: Block[]) => bs.reduce((h, b) => h + b.heightPt, 0);
const nodes = (bs: Block[]) => bs.map((b) => <Fragment key={b.key}>{b.node}</Fragment>);

/**
 * Components in the order the user entered them (the stored input keeps it), then any the engine added (water
 * from humidity) by falling mole fraction; a preset gas is listed by falling mole fraction.
 */
export function componentOrder(input: unknown, moleFractions: Record<string, number | undefined>): string[] {
  const entered = (input as { gas?: { components?: Record<string, unknown> } } | null)?.gas?.components;
  const first = entered ? Object.keys(entered).filter((k) => k in moleFractions) : [];
  const rest = Object.keys(moleFractions)
    .filter((k) => !first.includes(k))
    .sort((a, b) => (moleFractions[b] ?? 0) - (moleFractions[a] ?? 0));
  return [...first, ...rest];
}

/** Composition as mole and mass percentages beside the mixture's molar mass and pseudo-critical point. */
export function gasBlocks(s: DatasheetSnapshot): Block[] {
  const { View, Text } = pdfKit();
  const g = s.result.gas;
  const mass: Record<string, number | undefined> = g.massFractions;
  const mole: Record<string, number | undefined> = g.moleFractions;
  const rows = componentOrder(s.input, mole)
    .map((species) => [species, mole[species]] as const)
    .map(([species, x]) => [species, formatFixed((x ?? 0) * 100, 4), formatFixed((mass[species] ?? 0) * 100, 4)]);
  const table = tableBlocks(
    'gt',
    [
      { title: 'Component', widthPct: 34 },
      { title: 'Mole %', widthPct: 33, align: 'right' },
      { title: 'Mass %', widthPct: 33, align: 'right' },
    ],
    rows,
  );
  const facts = kvBlocks(
    'gk',
    [
      ['Gas', g.label],
      ['Molar mass', `${formatFixed(g.molarMassKgPerKmol, 3)} kg/kmol`],
      ['Specific gas constant R', `${formatFixed(g.gasConstantJPerKgK, 2)} J/(kg K)`],
      ['Pseudo-critical T (Kay)', `${formatFigure(g.pseudoCriticalTemperatureK)} K`],
      ['Pseudo-critical p (Kay)', `${formatFigure(g.pseudoCriticalPressureKpa)} kPa`],
    ],
    { labelPct: 55 },
  );
  const basis = `Composition basis: ${s.result.basis.gasComposition}`;
  const panel = (
    <View style={{ flexDirection: 'row' }} wrap={false}>
      <View style={{ width: '46%', marginRight: '4%' }}>{nodes(table)}</View>
      <View style={{ width: '50%' }}>{nodes(facts)}</View>
    </View>
  );
  return [
    headingBlock('1', 'Gas'),
    block('gp', Math.max(sum(table), sum(facts)), panel),
    block(
      'gb',
      3 + 9 * linesIn(basis, pct(100), 'small'),
      <Text style={[styles.small, { marginTop: 3 }]}>{basis}</Text>,
    ),
  ];
}
