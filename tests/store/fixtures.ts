/**
 * Test data for the store tests: the add-in's built-in table as records, and large synthetic tables
 * (2,000 rows and more) whose rows pass every table check.
 */
import { builtinTable } from '../../src/table/builtin';
import type { CoupleRecord, ElectrodeRecord } from '../../src/table/records';
import { type VersionedRecords, recordsOf } from '../../src/store/rows';
import { EMPTY_LOG, type RevisionLog, appendEntry } from '../../src/store/log';

export function builtin(): VersionedRecords {
  return recordsOf(builtinTable());
}

/** A built-in table of another version, for update tests: one E° changed, one row dropped, one row added. */
export function newerBuiltin(b: VersionedRecords, version = '2099.1'): VersionedRecords {
  const couples = b.couples.map((c) => (c.key === 'Cu2+/Cu' ? { ...c, e0: 0.3521 } : c)).filter((c) => c.key !== 'Au+/Au');
  couples.push({ key: 'Tl+/Tl', halfReaction: 'Tl+ + e- -> Tl', e0: -0.336, source: 'test data: a row new in the newer built-in table' });
  return { version, couples, electrodes: b.electrodes };
}

/**
 * n couple rows that all pass the table's checks: ketone → alcohol style reductions
 * "CkH2kO + 2H+ + 2e- -> CkH(2k+2)O" for k = 1…n, with sources and notes as long as real rows'.
 */
export function manyCouples(n: number, source?: string): CoupleRecord[] {
  const src = source ?? 'CRC Handbook of Chemistry and Physics, 92nd ed. (W. M. Haynes, ed., CRC Press, 2011), section 5, Electrochemical Series (P. Vanýsek)';
  const out: CoupleRecord[] = [];
  for (let k = 1; k <= n; k++) {
    const ox = `C${k}H${2 * k}O`;
    const red = `C${k}H${2 * k + 2}O`;
    out.push({
      key: `${ox}/${red}`,
      halfReaction: `${ox} + 2H+ + 2e- -> ${red}`,
      e0: Math.round((((k * 7919) % 4000) / 1000 - 2) * 10000) / 10000,
      ...(k % 3 === 0 ? { dEdT_mV_K: Math.round((((k * 31) % 200) / 100 - 1) * 1000) / 1000 } : {}),
      source: src,
      ...(k % 4 === 0 ? { note: `Synthetic row ${k} for the 2,000-row storage test.` } : {}),
    });
  }
  return out;
}

export function someElectrodes(): ElectrodeRecord[] {
  return [
    { key: 'Test-SCE', aliases: ['test calomel'], potential: 0.2412, dEdT_mV_K: -0.66, source: 'test data' },
    { key: 'Test-AgCl-3M', aliases: [], potential: 0.210, source: 'test data' },
  ];
}

/**
 * A revision log of `entries` typical edits (also built by `npm run bench`'s cold-store case): each
 * changes one row's E° by 1 mV and its source, by one of two people, with a reason of about 60
 * characters, an hour apart from 2026-01-01.
 */
export function typicalEditLog(rows: readonly Pick<CoupleRecord, 'key' | 'e0' | 'source'>[], entries: number, basedOn: string): RevisionLog {
  let log = EMPTY_LOG;
  for (let i = 0; i < entries; i++) {
    const r = rows[(i * 37) % rows.length];
    log = appendEntry(log, {
      revision: i + 1,
      at: new Date(Date.UTC(2026, 0, 1) + i * 3_600_000).toISOString(),
      by: i % 3 === 0 ? 'Q. Engineer' : 'P. Operator',
      why: `re-measured on plating line ${(i % 7) + 1} after the monthly calibration check`,
      action: 'edit',
      basedOn,
      rows: [{ table: 'couples', key: r.key, change: 'changed', fields: [{ field: 'e0', from: r.e0, to: r.e0 + 0.001 }, { field: 'source', from: r.source, to: `Plant QA measurement ${i + 1}` }] }],
      moreRows: 0,
    });
  }
  return log;
}
