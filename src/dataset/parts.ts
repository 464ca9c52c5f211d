/**
 * The parts of Cellwright's data set besides the potential table: the reference data the worksheet
 * functions read, one part per file of data/. The potential table (couples and electrodes) is the
 * data set's first part; it is stored and edited on its own (src/store/stored.ts). These parts are
 * read-only: a workbook can pin them (src/dataset/pinned.ts), never edit them.
 */
import anodes from '../../data/anodes.json';
import atomicWeights from '../../data/atomic-weights.json';
import cpCriteria from '../../data/cp-criteria.json';
import debyeHuckel from '../../data/debye-huckel.json';
import electrolysis from '../../data/electrolysis.json';
import galvanicSeries from '../../data/galvanic-series.json';
import species from '../../data/species.json';
import units from '../../data/units.json';
import water from '../../data/water.json';
import couples from '../../data/couples.json';

/** The data set's version: the version of the add-in's built-in data (the built-in table's), e.g. "2026.1". */
export const DATASET_VERSION: string = couples.version;

/** The parts besides the potential table, in the order they are listed. */
export const DATA_PARTS = ['atomicweights', 'species', 'debyehuckel', 'water', 'electrolysis', 'units', 'anodes', 'cpcriteria', 'galvanicseries'] as const;
export type DataPartName = (typeof DATA_PARTS)[number];

/** What each part holds: the content of its data file. */
export interface DataParts {
  readonly atomicweights: typeof atomicWeights;
  readonly species: typeof species;
  readonly debyehuckel: typeof debyeHuckel;
  readonly water: typeof water;
  readonly electrolysis: typeof electrolysis;
  readonly units: typeof units;
  readonly anodes: typeof anodes;
  readonly cpcriteria: typeof cpCriteria;
  readonly galvanicseries: typeof galvanicSeries;
}

/** The add-in's built-in parts. */
export const BUILTIN_PARTS: DataParts = Object.freeze({
  atomicweights: atomicWeights,
  species,
  debyehuckel: debyeHuckel,
  water,
  electrolysis,
  units,
  anodes,
  cpcriteria: cpCriteria,
  galvanicseries: galvanicSeries,
});

/** People's name of each part, its file, and the list inside it that holds its rows (for counts and comparisons). */
export const PART_INFO: Readonly<Record<DataPartName, { readonly title: string; readonly file: string; readonly rows: string; readonly rowKey: string }>> = {
  atomicweights: { title: 'Atomic weights', file: 'data/atomic-weights.json', rows: 'elements', rowKey: 'symbol' },
  species: { title: 'Species data', file: 'data/species.json', rows: 'species', rowKey: 'formula|state' },
  debyehuckel: { title: 'Activity-model constants (Debye–Hückel, Davies)', file: 'data/debye-huckel.json', rows: '', rowKey: '' },
  water: { title: 'Water (ion product, density)', file: 'data/water.json', rows: '', rowKey: '' },
  electrolysis: { title: 'Electrolysis data', file: 'data/electrolysis.json', rows: '', rowKey: '' },
  units: { title: 'Units', file: 'data/units.json', rows: 'units', rowKey: 'unit' },
  anodes: { title: 'Galvanic anodes', file: 'data/anodes.json', rows: 'anodes', rowKey: 'key' },
  cpcriteria: { title: 'CP criteria', file: 'data/cp-criteria.json', rows: 'criteria', rowKey: 'condition|electrode' },
  galvanicseries: { title: 'Galvanic series', file: 'data/galvanic-series.json', rows: 'series', rowKey: 'alloy' },
};

/** True when `name` is a part's name. */
export function isDataPartName(name: unknown): name is DataPartName {
  return typeof name === 'string' && (DATA_PARTS as readonly string[]).includes(name);
}
