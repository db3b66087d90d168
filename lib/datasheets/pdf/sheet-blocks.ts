import type { DatasheetSnapshot } from '../snapshot';
import { basisBlocks } from './basis-section';
import type { Block } from './blocks';
import { cautionBlocks } from './cautions-section';
import { compressorResultBlocks } from './compressor-results';
import { conditionsBlocks } from './conditions-section';
import { gasBlocks } from './gas-section';
import { heaterResultBlocks } from './heater-results';
import { identificationBlocks } from './identification';
import { PAGE_CONTENT_PT } from './measure';
import { revisionBlocks, signOffBlocks } from './record-sections';

/** Every block of the sheet in reading order (requires the renderer to be loaded). */
export function datasheetBlocks(s: DatasheetSnapshot): Block[] {
  const r = s.result;
  const sections: [string, Block[]][] = [
    ['id', identificationBlocks(s)],
    ['gas', gasBlocks(s)],
    ['cond', conditionsBlocks(s)],
    ['res', r.service === 'heater' ? heaterResultBlocks(r) : compressorResultBlocks(r)],
    ['basis', basisBlocks(s)],
    ['warn', cautionBlocks(r.warnings)],
    ['rev', revisionBlocks(s)],
    ['sign', signOffBlocks()],
  ];
  // Keys are unique across the whole page, so prefix each section's own keys.
  return sections.flatMap(([prefix, blocks]) => blocks.map((b) => ({ ...b, key: `${prefix}:${b.key}` })));
}

// Estimates are rounded up already; a little headroom more keeps near-full pages from spilling.
const CAPACITY_PT = PAGE_CONTENT_PT * 0.99;

/**
 * Blocks packed in order onto pages by estimated height, a block marked keepWithNext always sharing a
 * page with the one after it. Null when a group could not fit even an empty page.
 */
export function planPages(blocks: Block[], capacityPt = CAPACITY_PT): Block[][] | null {
  const pages: Block[][] = [[]];
  let used = 0;
  for (let i = 0; i < blocks.length;) {
    const group: Block[] = [blocks[i]!];
    while (group.at(-1)!.keepWithNext && i + group.length < blocks.length) group.push(blocks[i + group.length]!);
    const height = group.reduce((h, b) => h + b.heightPt, 0);
    if (height > capacityPt) return null;
    if (used + height > capacityPt && pages.at(-1)!.length > 0) {
      pages.push([]);
      used = 0;
    }
    pages.at(-1)!.push(...group);
    used += height;
    i += group.length;
  }
  return pages;
}
