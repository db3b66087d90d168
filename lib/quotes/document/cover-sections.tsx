/** @jsxRuntime automatic @jsxImportSource react */
import { severityLabel } from '@/lib/datasheets/format';
import { block, headingBlock, kvBlocks, tableBlocks, type Block, type Column } from '@/lib/datasheets/pdf/blocks';
import { MONO, pdfKit } from '@/lib/datasheets/pdf/kit';
import { pct, rowHeight } from '@/lib/datasheets/pdf/measure';
import { colors, styles } from '@/lib/datasheets/pdf/theme';
import type { CoverModel } from './cover-model';

// The hazards every line of a heater or compressor quote carries, whatever its figures [cp].
export const STANDING_CAUTIONS = [
  'Hot surfaces: heater sheaths, terminal housings and outlet piping, and compressor discharge lines, can burn on contact. Guard and label them.',
  'Pressure: the equipment holds gas under pressure. Relief, isolation and venting follow the local pressure-equipment code.',
  'Electrical loads: supply, protection and isolation are designed by a qualified person under the local electrical code.',
  'Flammable or oxidising gases need a hazardous-area assessment before any equipment is selected or installed.',
];

function Identity({ m }: { m: CoverModel }) {
  const { View, Text } = pdfKit();
  return (
    <View wrap={false}>
      <Text style={styles.title}>{m.title}</Text>
      <Text style={styles.subtitle}>Quote with its equipment datasheets. Preliminary sizing.</Text>
      <View style={[styles.idGrid, { flexWrap: 'wrap' }]}>
        {m.identity.map(([label, value]) => (
          <View key={label} style={styles.idCell}>
            <Text style={styles.idLabel}>{label}</Text>
            <Text style={styles.idValue}>{value}</Text>
          </View>
        ))}
      </View>
    </View>
  );
}

function CautionRow({ tag, label, color, text }: { tag: string; label: string; color: string; text: string }) {
  const { View, Text } = pdfKit();
  return (
    <View style={styles.row} wrap={false}>
      <Text style={{ width: '13%', fontWeight: 600, color }}>{label}</Text>
      <Text style={{ width: '14%', fontFamily: MONO }}>{tag}</Text>
      <Text style={{ width: '73%' }}>{text}</Text>
    </View>
  );
}

function lineColumns(priced: boolean): Column[] {
  const base: Column[] = [
    { title: 'Pos.', widthPct: 5 },
    { title: 'Tag', widthPct: 10 },
    { title: 'Sizing', widthPct: priced ? 23 : 33 },
    { title: 'Headline', widthPct: priced ? 17 : 22 },
    { title: 'Datasheet', widthPct: priced ? 15 : 22 },
    { title: 'Qty', widthPct: priced ? 5 : 8, align: 'right' },
  ];
  if (!priced) return base;
  return [
    ...base,
    { title: 'Unit price', widthPct: 12, align: 'right' },
    { title: 'Amount', widthPct: 13, align: 'right' },
  ];
}

/** Every block of the cover in reading order (requires the renderer to be loaded). */
export function coverBlocks(m: CoverModel): Block[] {
  const cautionRow = (key: string, tag: string, label: string, color: string, text: string) =>
    block(
      key,
      rowHeight([{ text, widthPt: pct(73) }]),
      <CautionRow tag={tag} label={label} color={color} text={text} />,
    );
  const appended = m.appended.length
    ? tableBlocks(
        'ap',
        [
          { title: 'Datasheet', widthPct: 40 },
          { title: 'Tag', widthPct: 40 },
          { title: 'Pages', widthPct: 20, align: 'right' },
        ],
        m.appended,
      )
    : kvBlocks('ap', [['Appended', 'No line has an issued datasheet yet.']], { mono: false });
  return [
    block('id', 150, <Identity m={m} />),
    headingBlock('1', 'Lines'),
    ...tableBlocks('ln', lineColumns(m.priced), m.lines),
    headingBlock('2', 'Totals'),
    ...kvBlocks('tt', m.totals),
    headingBlock('3', 'Sizing basis per line'),
    ...tableBlocks(
      'bs',
      [
        { title: 'Pos.', widthPct: 5 },
        { title: 'Gas', widthPct: 25 },
        { title: 'Headline and conditions', widthPct: 70 },
      ],
      m.basis,
    ),
    headingBlock('4', 'Cautions'),
    ...STANDING_CAUTIONS.map((text, i) => cautionRow(`sc${i}`, 'All lines', 'CAUTION', colors.severity.caution, text)),
    ...m.cautions.map(({ tag, warning }, i) =>
      cautionRow(`cw${i}`, tag, severityLabel(warning.severity), colors.severity[warning.severity], warning.message),
    ),
    ...kvBlocks('cn', [['Further cautions', 'Each datasheet lists every caution of its line in its section 5.']], {
      mono: false,
    }),
    headingBlock('5', 'Datasheets appended after this cover'),
    ...appended,
  ];
}
