// The part of dxf-parser that geometry/ uses. tsconfig.geometry.json maps the package here,
// because the package's own declarations pull in Node's types, which geometry/ must not see.
export default class DxfParser {
  parseSync(source: string): unknown;
}
