/** A state an equation of state cannot give: no root on the requested branch, or a solve that did not converge. */
export class EosError extends Error {
  constructor(message: string) {
    super(message);
    this.name = 'EosError';
  }
}
