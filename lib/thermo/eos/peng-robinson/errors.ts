/** An input the Peng-Robinson or phase code cannot use; `path` names the field (e.g. "temperatureK", "components.CH4"). */
export class EosInputError extends Error {
  readonly path: string;
  constructor(path: string, message: string) {
    super(message);
    this.name = 'EosInputError';
    this.path = path;
  }
}

/** Throws unless `value` is a finite number above zero. */
export function requirePositive(path: string, value: number, unit: string): void {
  if (typeof value !== 'number' || !Number.isFinite(value) || value <= 0) {
    throw new EosInputError(path, `${path} must be a finite number above 0 ${unit}; got ${String(value)}`);
  }
}
