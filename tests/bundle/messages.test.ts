/**
 * Errors that explain themselves, through the production bundle: miscapitalised element symbols in
 * the deposition functions, couples written Red/Ox, electrode names without their filling, unicode
 * sub- and superscripts.
 */
import { describe, expect, it } from 'vitest';
import { bundleUnderTest, isError, messageOf, one } from './harness';

const { run } = bundleUnderTest();

describe('miscapitalised symbols in the deposition functions', () => {
  it('PLATETIME(10, 2, "NI", 2, 8.9) is #VALUE! "did you mean Ni?", no longer 10.16 min', async () => {
    const r = one(await run('PLATETIME', 10, 2, 'NI', 2, 8.9, null));
    expect(isError(r, '#VALUE!')).toBe(true);
    expect(messageOf(r)).toMatch(/did you mean Ni\?/);
    // Faraday's law with Ni (58.693 g/mol, IUPAC CIAAW 2021 abridged): 24.38 min (common practice)
    expect(one(await run('PLATETIME', 10, 2, 'Ni', 2, 8.9, null)) as number).toBeCloseTo(24.38, 2);
  });
  it('a range: only the miscapitalised cells are errors, each with its own element', async () => {
    const r = (await run('DEPOSITMASS', 10, 1, [['Cu'], ['CU'], ['SN'], ['PB'], ['CO']], 2, null)) as unknown[][];
    // m = I·t·M/(nF) = 10 A · 3600 s · 63.546 / (2 · 96485.33212) = 11.855 g (Faraday's law, common practice)
    expect(r[0][0] as number).toBeCloseTo(11.855, 3);
    expect(messageOf(r[1][0])).toMatch(/did you mean Cu\?/);
    expect(messageOf(r[2][0])).toMatch(/did you mean Sn\?/);
    expect(messageOf(r[3][0])).toMatch(/did you mean Pb\?/);
    expect(messageOf(r[4][0])).toMatch(/did you mean Co\?/);
  });
  it('MOLARMASS keeps CO as carbon monoxide and reads subscripts', async () => {
    expect(one(await run('MOLARMASS', 'CO')) as number).toBeCloseTo(28.01, 2); // 12.011 + 15.999, IUPAC CIAAW 2021 abridged
    expect(one(await run('MOLARMASS', 'NiSO₄·6H₂O'))).toBe(one(await run('MOLARMASS', 'NiSO4·6H2O')));
  });
});

describe('names people type', () => {
  it('a reversed couple says which way to write it', async () => {
    const r = one(await run('STDPOTENTIAL', 'Zn/Zn2+', null));
    expect(isError(r, '#N/A')).toBe(true);
    expect(messageOf(r)).toMatch(/write Ox\/Red: Zn2\+\/Zn/);
  });
  it('a couple in superscripts is found', async () => {
    expect(one(await run('STDPOTENTIAL', 'Cu²⁺/Cu', null))).toBe(one(await run('STDPOTENTIAL', 'Cu2+/Cu', null)));
  });
  it('Ag/AgCl without its filling is #N/A with what to write; NHE is read as the SHE scale', async () => {
    const ssc = one(await run('REFPOTENTIAL', 'SSC', null));
    expect(isError(ssc, '#N/A')).toBe(true);
    expect(messageOf(ssc)).toMatch(/needs its filling.*Ag\/AgCl\/KCl\(sat\)/);
    // NHE names the SHE scale (common practice): the same answer as from "SHE"
    expect(one(await run('CONVERTPOTENTIAL', 0.5, 'NHE', 'SCE', null, null))).toBe(one(await run('CONVERTPOTENTIAL', 0.5, 'SHE', 'SCE', null, null)));
    expect(one(await run('REFPOTENTIAL', 'Cu/CuSO4', null))).toBe(0.316); // data/electrodes.json row CSE
  });
});
