/** Which basis gives a couple's E° away from 25 °C (species data, the row's dE/dT, or 25 °C only). */
import { e0Basis } from '../../src/cells/e0Basis';
import type { CoupleRow } from '../../src/table/types';
import { worksheet } from '../adapter';
import { couple } from '../args';

export const E0BASIS = worksheet({ id: 'E0BASIS', args: [couple()], compute: (row: CoupleRow) => e0Basis(row), usesTable: true });
