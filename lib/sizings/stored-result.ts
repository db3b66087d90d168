import { ENGINE_VERSION, sizingRequestSchema, type SizingInput, type SizingResult } from '@/lib/engine';

export type StoredSizing = { input: SizingInput; result: SizingResult };

/**
 * The saved input and result in the engine's own shapes, for showing a saved sizing with the desk's
 * breakdown; null when the record was written by an engine whose result shape this one does not know
 * (the page then shows the stored figures as a plain table). The figures shown are the saved ones,
 * never recomputed.
 */
export function readStoredSizing(input: unknown, result: unknown): StoredSizing | null {
  const parsed = sizingRequestSchema.safeParse(input);
  if (!parsed.success || typeof result !== 'object' || result === null) return null;
  const r = result as Partial<SizingResult> & { heater?: unknown; compressor?: unknown };
  const sameMajor =
    typeof r.engineVersion === 'string' && r.engineVersion.split('.')[0] === ENGINE_VERSION.split('.')[0];
  const block = r.service === 'heater' ? r.heater : r.service === 'compressor' ? r.compressor : undefined;
  if (!sameMajor || r.service !== parsed.data.service || typeof block !== 'object' || block === null) return null;
  if (!Array.isArray(r.warnings) || typeof r.basis !== 'object' || r.basis === null) return null;
  return { input: parsed.data, result: result as SizingResult };
}
