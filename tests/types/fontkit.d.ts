// The few members of fontkit the glyph-coverage test reads (the package ships no types).
declare module 'fontkit' {
  export function create(data: Buffer): { characterSet: number[] };
}
