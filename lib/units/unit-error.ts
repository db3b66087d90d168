/** A unit string that does not belong to the quantity kind asked for. */
export class UnitError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'UnitError';
  }
}
