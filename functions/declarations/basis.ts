/**
 * Worksheet declarations: the basis of a couple's E° at temperature.
 *
 * JSDoc for custom-functions-metadata-plugin and one call into functions/families/basis.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/basis';

/**
 * Which basis moves a couple's E° away from 25 °C, in order of precedence: "species (with ΔrCp)" or "species (ΔrCp = 0)" when the species data (NBS 1982) cover every species of its half-reaction; else "dE/dT" (the row's linear coefficient); else "25 °C only".
 * @customfunction E0BASIS
 * @helpurl https://localhost:3000/docs/functions.html#e0basis
 * @param couple Couple key written Ox/Red, e.g. "O2/H2O".
 * @returns The basis (text).
 */
function e0BasisOf(couple: any[][]): any[][] {
  return F.E0BASIS(couple) as any;
}
