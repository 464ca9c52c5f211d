import { describe, expect, it } from 'vitest';
import { builtinTable } from '../../src/table/builtin';
import { coupleKeyHint, electrodeKeyHint } from '../../src/table/suggest';

const t = builtinTable();

describe('coupleKeyHint', () => {
  it('a couple written Red/Ox gets the Ox/Red key', () => {
    expect(coupleKeyHint(t, 'Zn/Zn2+')).toBe('write Ox/Red: Zn2+/Zn');
    expect(coupleKeyHint(t, 'Cu / Cu(2+)')).toBe('write Ox/Red: Cu2+/Cu');
    expect(coupleKeyHint(t, 'Ni/Ni²⁺')).toBe('write Ox/Red: Ni2+/Ni');
  });
  it('a near miss gets the nearest keys; nonsense gets nothing', () => {
    expect(coupleKeyHint(t, 'Zn3+/Zn')).toContain('"Zn2+/Zn"');
    expect(coupleKeyHint(t, 'qqqqqqqqqqqq/wwwwwwwwwww')).toBe('');
  });
});

describe('electrodeKeyHint', () => {
  it('Ag/AgCl without its filling lists the fillings', () => {
    for (const k of ['SSC', 'Ag/AgCl', 'ag / agcl']) {
      const h = electrodeKeyHint(t, k);
      expect(h).toContain('needs its filling');
      expect(h).toContain('"Ag/AgCl/KCl(sat)"');
      expect(h).toContain('"Ag/AgCl/KCl(3M)"');
    }
  });
  it('NHE points to SHE; a misspelt key gets its nearest keys', () => {
    expect(electrodeKeyHint(t, 'NHE')).toContain('"SHE"');
    expect(electrodeKeyHint(t, 'Ag/AgCl/KCl(3 M')).toContain('"Ag/AgCl/KCl(3M)"');
    expect(electrodeKeyHint(t, 'Cu/CuSO4(sat')).toContain('"CSE"');
  });
  it('the practitioners\u2019 aliases of the table are found as they are', () => {
    expect(t.findElectrode('Cu/CuSO4')?.key).toBe('CSE');
    expect(t.findElectrode('saturated calomel')?.key).toBe('SCE');
  });
});
