/**
 * convert-units publishes its definition subpaths only through package.json "exports",
 * which the server tsconfig's `moduleResolution: node10` does not read. This declaration
 * lets that config type the import; the runtime (jest, Metro, node) resolves it normally.
 */
declare module 'convert-units/definitions/all' {
  import type { Measure } from 'convert-units';
  const allMeasures: Record<string, Measure<string, string>>;
  export default allMeasures;
}
