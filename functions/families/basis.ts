/** Which basis gives a couple's E° away from 25 °C (species data, the row's dE/dT, or 25 °C only). */
import { e0Basis } from '../../src/cells/e0Basis';
import type { CoupleRow } from '../../src/table/types';
import { worksheet } from '../adapter';
import { couple } from '../args';

export const E0BASIS = worksheet({ id: 'E0BASIS', description: 'Which basis moves a couple\'s E° away from 25 °C, in order of precedence: "species (with ΔrCp)" or "species (ΔrCp = 0)" when the species data (NBS 1982) cover every species of its half-reaction; else "dE/dT" (the row\'s linear coefficient); else "25 °C only".', args: [{ ...couple(), help: 'Couple key written Ox/Red, e.g. "O2/H2O".' }], result: 'The basis (text).', helpAnchor: 'e0basis', compute: (row: CoupleRow) => e0Basis(row), usesTable: true });
