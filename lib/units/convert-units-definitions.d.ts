/**
 * convert-units publishes its definition subpaths only through package.json "exports",
 * which the server tsconfig's `moduleResolution: node10` does not read. These declarations
 * let that config type the imports; the runtime (jest, Metro, node) resolves them normally.
 */
declare module 'convert-units/definitions/length' {
  import type { Measure } from 'convert-units';
  const measure: Measure<string, string>;
  export default measure;
}
declare module 'convert-units/definitions/voltage' {
  import type { Measure } from 'convert-units';
  const measure: Measure<string, string>;
  export default measure;
}
declare module 'convert-units/definitions/current' {
  import type { Measure } from 'convert-units';
  const measure: Measure<string, string>;
  export default measure;
}
