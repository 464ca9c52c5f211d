/**
 * JavaScript's built-in objects, looked up once.
 *
 * The build (webpack.config.cjs, ProvidePlugin) binds every free use of these names in the bundled
 * modules to the exports below, so the bundle looks each of them up on the global object once, when
 * it is evaluated, instead of at every use. In Excel's runtime that changes nothing measurable; in a
 * node:vm context (the test harness, the benchmark, the demo) every global look-up goes through the
 * context's interceptor and costs about 150 ns, which would otherwise dominate every hot loop
 * (`Math.log` in NERNST cost 10× the arithmetic). The objects are the very same built-ins.
 *
 * This module must reach them through `globalThis` (a free use of the names here would be bound
 * to this module itself).
 */
const g = globalThis;

export const Math = g.Math;
export const Number = g.Number;
export const Array = g.Array;
export const Object = g.Object;
export const String = g.String;
export const JSON = g.JSON;
export const Map = g.Map;
export const Set = g.Set;
