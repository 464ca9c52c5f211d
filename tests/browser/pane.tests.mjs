// Browser tests of the task pane (run by scripts/test-browser.mjs in headless Chromium, 320 px wide).
//
// The page is the built dist/taskpane.html: it loads functions.js and taskpane.js like Excel's shared
// runtime, with tests/browser/stub-office.js standing in for office.js. Each test gets a fresh browser
// context (a new, empty workbook); reloading a page is closing and reopening the workbook.
//
// Every test checks results through what a user sees (text, focus, dialogs) and through the workbook:
// the stored setting, the recalculations Excel was asked for, and what the worksheet functions
// registered by functions.js now answer.
import assert from 'node:assert/strict';
import { createHash } from 'node:crypto';
import { readFileSync } from 'node:fs';
import { dirname, resolve } from 'node:path';
import { fileURLToPath } from 'node:url';
import ExcelJS from 'exceljs';
import { checkWorkbook } from '../../scripts/lib/check.mjs';

const root = resolve(dirname(fileURLToPath(import.meta.url)), '../..');
const couplesFile = JSON.parse(readFileSync(resolve(root, 'data/couples.json'), 'utf8'));
const BUILTIN_VERSION = couplesFile.version;
const builtinE0 = (key) => couplesFile.couples.find((c) => c.key === key).e0;
const KEY = 'cellwright.potentialTable';
const DATA_KEY = 'cellwright.pinnedData';
const atomicWeightsFile = JSON.parse(readFileSync(resolve(root, 'data/atomic-weights.json'), 'utf8'));
const NI = atomicWeightsFile.elements.find((e) => e.symbol === 'Ni').atomicWeight;
const COMPUTED_WITH_KEY = 'cellwright.computedWith';

/* ------------------------------------------------------------------------------------------------ */
/* Helpers                                                                                          */
/* ------------------------------------------------------------------------------------------------ */

async function ready(page) {
  await page.waitForFunction(() => document.getElementById('app')?.getAttribute('aria-busy') === 'false');
  await page.waitForFunction(() => !/Reading the workbook/.test(document.getElementById('in-use-body')?.textContent ?? ''));
  // The functions' start-up has finished: it records the table the results are computed with (after
  // recalculating once when that differs from the record, as on a workbook's first opening).
  await page.waitForFunction((k) => window.__stubWorkbook.file().settings[k] !== undefined, COMPUTED_WITH_KEY);
}

async function openPane(open) {
  const page = await open();
  await ready(page);
  return page;
}

async function reopen(page) {
  await page.reload();
  await ready(page);
}

const stored = (page) => page.evaluate((k) => window.__stubWorkbook.file().settings[k] ?? null, KEY);
const calculations = (page) => page.evaluate(() => window.__stubWorkbook.file().calculations);
/** What =CELLWRIGHT.STDPOTENTIAL(key) shows now, through the function functions.js registered. */
const cellE0 = (page, key) => page.evaluate((k) => window.__stubWorkbook.call('STDPOTENTIAL', [[k]], null), key);

async function text(page, selector) {
  return (await page.locator(selector).innerText()).replace(/\s+/g, ' ').trim();
}

async function notice(page) {
  await page.waitForFunction(() => (document.getElementById('notice')?.textContent ?? '').trim() !== '' || (document.getElementById('problem')?.textContent ?? '').trim() !== '');
  return `${await page.locator('#notice').innerText()} ${await page.locator('#problem').innerText()}`.replace(/\s+/g, ' ').trim();
}

async function waitIdle(page) {
  await page.waitForFunction(() => document.getElementById('app')?.getAttribute('aria-busy') === 'false');
}

/** Nothing is wider than the 320 px pane. */
async function fitsWidth(page) {
  const w = await page.evaluate(() => ({ scroll: document.documentElement.scrollWidth, client: document.documentElement.clientWidth }));
  assert.ok(w.scroll <= w.client, `the page is ${w.scroll} px wide in a ${w.client} px pane`);
}

/** Every form control has a label, every button an accessible name. */
async function labelled(page) {
  const missing = await page.evaluate(() => {
    const out = [];
    for (const el of document.querySelectorAll('input, textarea, select')) {
      if (el.type === 'hidden' || el.closest('[hidden]')) continue;
      const named = el.labels?.length > 0 || el.getAttribute('aria-label') || el.getAttribute('aria-labelledby');
      if (!named) out.push(`${el.tagName.toLowerCase()}#${el.id}`);
    }
    for (const b of document.querySelectorAll('button')) {
      if (b.closest('[hidden]') || b.closest('dialog:not([open])')) continue;
      if (!(b.getAttribute('aria-label') || b.textContent.trim())) out.push(`button#${b.id}`);
    }
    return out;
  });
  assert.deepEqual(missing, [], `unlabelled controls: ${missing.join(', ')}`);
}

async function fill(page, kind, fields) {
  for (const [name, value] of Object.entries(fields)) await page.fill(`#f-${kind}-${name}`, value);
}

/** Gives the name (while the pane asks for it) and a reason, as every save asks. */
async function signoff(page, prefix, why = 'browser test: checking the pane') {
  if (await page.isVisible(`#${prefix}-by`)) await page.fill(`#${prefix}-by`, 'T. Browser');
  if ((await page.locator(`#${prefix}-why`).count()) > 0) await page.fill(`#${prefix}-why`, why);
}

/** Saves an editor form, giving a reason first. */
async function save(page, kind, why) {
  await signoff(page, `f-${kind}`, why);
  await page.click(`#save-${kind}`);
}

async function addCouple(page, fields) {
  await page.click('#add-couple');
  await fill(page, 'couple', fields);
  await save(page, 'couple');
  await waitIdle(page);
  await page.waitForSelector('#editor-couple', { state: 'hidden' });
}

const row = (page, kind, key) => page.locator(`#list-${kind} > li`).filter({ has: page.locator('.row-key', { hasText: new RegExp(`^${key.replace(/[.*+?^${}()|[\]\\]/g, '\\$&')}$`) }) });

async function confirmDialog(page, accept = true, why = undefined) {
  await page.waitForSelector('dialog#confirm[open]');
  if (accept) await signoff(page, 'confirm', why);
  await page.click(accept ? '#confirm-ok' : '#confirm-cancel');
  await page.waitForSelector('dialog#confirm', { state: 'hidden' });
}

/** Canonical JSON and the checksum as DEVELOPERS.md documents them, written out independently here. */
function canonical(v) {
  if (v === null) return 'null';
  if (Array.isArray(v)) return `[${v.map(canonical).join(',')}]`;
  if (typeof v === 'object') {
    return `{${Object.keys(v).filter((k) => v[k] !== undefined).sort().map((k) => `${JSON.stringify(k)}:${canonical(v[k])}`).join(',')}}`;
  }
  return JSON.stringify(v);
}
function reseal(doc) {
  const sorted = (l) => [...l].sort();
  const content = {
    basedOn: doc.basedOn,
    couples: doc.couples,
    electrodes: doc.electrodes,
    own: { couples: sorted(doc.own.couples), electrodes: sorted(doc.own.electrodes) },
    removed: { couples: sorted(doc.removed.couples), electrodes: sorted(doc.removed.electrodes) },
  };
  return JSON.stringify({ ...doc, checksum: `sha256:${createHash('sha256').update(canonical(content), 'utf8').digest('hex')}` });
}

const sha = (content) => `sha256:${createHash('sha256').update(canonical(content), 'utf8').digest('hex')}`;

/** The pinned-data text with every part's checksum and the overall one recomputed (as another add-in version would write it). */
function resealData(doc) {
  const sums = {};
  for (const [name, part] of Object.entries(doc.parts)) {
    part.checksum = sha(part.content);
    sums[name] = part.checksum;
  }
  return JSON.stringify({ ...doc, checksum: sha(sums) });
}

/** =CELLWRIGHT.PLATETIME(25, 4, "Ni", 2, 8.908): minutes to plate 25 µm of nickel at 4 A/dm². */
const plateNi = (page) => page.evaluate(() => window.__stubWorkbook.call('PLATETIME', [[25]], [[4]], [['Ni']], [[2]], [[8.908]], null));
/** Faraday's law t = d·ρ·n·F/(M·j) in min (common practice), F = N_A·e (CODATA 2018, exact). */
const plateMinutes = (M) => (25e-4 * 8.908 * 2 * 6.02214076e23 * 1.602176634e-19) / (M * 0.04) / 60;

/* ------------------------------------------------------------------------------------------------ */
/* Tests                                                                                            */
/* ------------------------------------------------------------------------------------------------ */

export const tests = [
  {
    name: 'start: the built-in table is in use, nothing is stored, cautions are shown, 320 px fits',
    async run({ open, shot }) {
      const page = await openPane(open);
      const inUse = await text(page, '#in-use');
      assert.match(inUse, new RegExp(`Built-in table ${BUILTIN_VERSION}`));
      assert.match(inUse, new RegExp(`Couples ${couplesFile.couples.length}`));
      assert.match(inUse, /Checksum sha256:[0-9a-f]{64}/);
      assert.match(inUse, /no table of its own/);
      assert.match(inUse, /Worksheet functions: use the built-in table/);
      assert.equal(await stored(page), null);
      // First opening: nothing recorded, so the functions recalculated once and recorded the table in use.
      assert.deepEqual(await calculations(page), ['Full']);
      const recorded = await page.evaluate((k) => window.__stubWorkbook.file().settings[k], COMPUTED_WITH_KEY);
      assert.ok(inUse.includes(`Checksum ${recorded}`), `recorded ${recorded}`);
      await reopen(page);
      assert.deepEqual(await calculations(page), ['Full']); // reopened with the same table: no recalculation
      assert.match(await text(page, '#count-couple'), new RegExp(`^${couplesFile.couples.length} couples`));
      assert.equal(await cellE0(page, 'Cu2+/Cu'), builtinE0('Cu2+/Cu'));
      assert.match(await text(page, '.app-footer'), /H2.*Cl2.*HCN.*cyanide.*chromium\(VI\).*local codes/);
      await fitsWidth(page);
      await labelled(page);
      // A strict Content-Security-Policy, and nothing inline it would have to allow.
      const page0 = await page.evaluate(() => ({
        csp: document.querySelector('meta[http-equiv="Content-Security-Policy"]')?.getAttribute('content') ?? '',
        inlineScripts: [...document.scripts].filter((sc) => !sc.src).length,
        styled: document.querySelectorAll('[style]').length,
        handlers: [...document.querySelectorAll('*')].filter((e) => [...e.attributes].some((a) => /^on/i.test(a.name))).length,
        scripts: [...document.scripts].map((sc) => new URL(sc.src).pathname),
      }));
      for (const d of ["default-src 'self'", "script-src 'self'", "style-src 'self'", "object-src 'none'", "base-uri 'none'"]) assert.ok(page0.csp.includes(d), `CSP lacks ${d}`);
      assert.doesNotMatch(page0.csp, /unsafe|\*/);
      assert.deepEqual({ inline: page0.inlineScripts, styled: page0.styled, handlers: page0.handlers }, { inline: 0, styled: 0, handlers: 0 });
      assert.deepEqual(page0.scripts, ['/office-js/office.js', '/data.js', '/functions.js', '/taskpane.js']);
      await shot(page, '01-built-in-table-in-use');
      await page.click('#tab-about');
      const about = await text(page, '#panel-about');
      for (const needle of [/hydrogen/, /chlorine/, /hydrogen cyanide/, /Cyanide baths/, /chromium\(VI\)/, /Cathodic protection/, /responsibility of the qualified engineer/, /Local codes, standards, regulations and licensed professional practice/, /Thermoddem/]) {
        assert.match(about, needle);
      }
      await fitsWidth(page);
      await shot(page, '02-about-and-cautions');
    },
  },

  {
    name: 'add a couple: validation as you type, n derived, stored, functions answer it, recalculated',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#add-couple');
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'f-couple-halfReaction');
      await page.fill('#f-couple-halfReaction', 'Tl+ + 2e- -> Tl');
      assert.match(await text(page, '#f-couple-halfReaction-error'), /charge/i);
      assert.equal(await page.getAttribute('#f-couple-halfReaction', 'aria-invalid'), 'true');
      await page.fill('#f-couple-halfReaction', 'Tl+ + e- -> Tl');
      assert.equal(await text(page, '#f-couple-halfReaction-info'), 'Balanced · n = 1 electron');
      assert.equal(await page.getAttribute('#f-couple-halfReaction', 'aria-invalid'), null);
      assert.match(await text(page, '#f-couple-key-info'), /Suggested from the half-reaction: Tl\+\/Tl/);
      await page.fill('#f-couple-key', 'Tl+/Tl');
      await page.fill('#f-couple-e0', 'abc');
      assert.match(await text(page, '#f-couple-e0-error'), /must be a number/);
      await shot(page, '03-add-couple-validation-error', '#editor-couple');
      // Saving with errors saves nothing and says why.
      await save(page, 'couple');
      assert.match(await text(page, '#f-couple-form-error'), /Not saved/);
      assert.match(await text(page, '#f-couple-source-error'), /source is required/);
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'f-couple-e0');
      assert.equal(await stored(page), null);
      await page.fill('#f-couple-e0', '−0.336');
      await page.fill('#f-couple-source', 'Our lab, thallium study 2026');
      await save(page, 'couple');
      await waitIdle(page);
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      assert.match(await notice(page), /Added couple Tl\+\/Tl/);
      const doc = JSON.parse(await stored(page));
      assert.equal(doc.revision, 1);
      assert.deepEqual(doc.own.couples, ['Tl+/Tl']);
      assert.equal(await cellE0(page, 'Tl+/Tl'), -0.336);
      // One at the first opening (nothing recorded yet), one for the change.
      assert.deepEqual(await calculations(page), ['Full', 'Full']);
      const r = row(page, 'couple', 'Tl+/Tl');
      assert.match(await r.innerText(), /−0\.336 V[\s\S]*n = 1[\s\S]*Added in this workbook/);
      // Focus is on the new row's Edit button.
      assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Edit Tl+/Tl');
      assert.match(await text(page, '#in-use'), /This workbook’s own table.*Revision 1.*Differ from built-in 1 row/);
      await fitsWidth(page);
      await shot(page, '04-couple-added');
    },
  },

  {
    name: 'edit a row with a validation error, then save: the functions use the new value',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.fill('#filter-couple', 'Cu2+/Cu');
      await row(page, 'couple', 'Cu2+/Cu').getByRole('button', { name: 'Edit Cu2+/Cu' }).click();
      assert.match(await text(page, '#editor-couple-title'), /Edit couple Cu2\+\/Cu/);
      assert.equal(await page.inputValue('#f-couple-e0'), String(builtinE0('Cu2+/Cu')));
      await page.fill('#f-couple-e0', '9');
      await page.fill('#f-couple-source', '');
      assert.match(await text(page, '#f-couple-e0-error'), /between -4 and 4 V/);
      assert.match(await text(page, '#f-couple-source-error'), /source is required/);
      await save(page, 'couple');
      assert.match(await text(page, '#f-couple-form-error'), /Not saved/);
      await shot(page, '05-edit-validation-errors', '#editor-couple');
      assert.equal(await stored(page), null);
      await page.fill('#f-couple-e0', '0.3521');
      await page.fill('#f-couple-source', 'Plant QA measurement, 2026-02');
      await save(page, 'couple');
      await waitIdle(page);
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      assert.equal(await cellE0(page, 'Cu2+/Cu'), 0.3521);
      assert.match(await row(page, 'couple', 'Cu2+/Cu').innerText(), /Edited here: E°, source/);
      // Escape closes the editor without saving.
      await row(page, 'couple', 'Cu2+/Cu').getByRole('button', { name: 'Edit Cu2+/Cu' }).click();
      await page.fill('#f-couple-e0', '0.5');
      await page.keyboard.press('Escape');
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      assert.equal(await cellE0(page, 'Cu2+/Cu'), 0.3521);
      assert.equal(JSON.parse(await stored(page)).revision, 1);
    },
  },

  {
    name: 'edit a reference electrode: other names one per line, a name in use and a "|" are refused',
    async run({ open }) {
      const page = await openPane(open);
      await page.click('#tab-electrodes');
      await page.fill('#filter-electrode', 'SSCE');
      await row(page, 'electrode', 'SSCE').getByRole('button', { name: 'Edit SSCE' }).click();
      assert.match(await text(page, '#editor-electrode-title'), /Edit reference electrode SSCE/);
      await page.fill('#f-electrode-aliases', 'saturated calomel');
      assert.match(await text(page, '#f-electrode-aliases-error'), /another electrode already uses the name saturated calomel/i);
      await page.fill('#f-electrode-aliases', 'sodium calomel|x');
      assert.match(await text(page, '#f-electrode-aliases-error'), /cannot hold "\|"/);
      await page.fill('#f-electrode-aliases', 'sodium calomel\nbench SSCE');
      await page.fill('#f-electrode-potential', '0.2371');
      await page.fill('#f-electrode-source', 'Plant reference check, 2026');
      await save(page, 'electrode');
      await waitIdle(page);
      await page.waitForSelector('#editor-electrode', { state: 'hidden' });
      const e = JSON.parse(await stored(page)).electrodes.find((x) => x.key === 'SSCE');
      assert.deepEqual(e.aliases, ['sodium calomel', 'bench SSCE']);
      assert.equal(e.potential, 0.2371);
      assert.match(await row(page, 'electrode', 'SSCE').innerText(), /\+0\.2371 V[\s\S]*also: sodium calomel, bench SSCE[\s\S]*Edited here: other names, potential, source/);
      assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Edit SSCE');
    },
  },

  {
    name: 'delete and revert: #N/A after delete, restored from the built-in table, edited row reverted',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.fill('#filter-couple', 'Zn');
      await row(page, 'couple', 'Zn2+/Zn').getByRole('button', { name: 'Delete Zn2+/Zn' }).click();
      await page.waitForSelector('dialog#confirm[open]');
      assert.match(await text(page, '#confirm'), /Delete Zn2\+\/Zn\?.*#N\/A.*restored/);
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'confirm-by'); // the name is asked first (none remembered yet)
      assert.equal(await page.isDisabled('#confirm-ok'), true); // nothing is deleted without a reason
      await shot(page, '06-confirm-delete');
      await confirmDialog(page, true);
      await waitIdle(page);
      const na = await cellE0(page, 'Zn2+/Zn');
      assert.equal(na.error, '#N/A');
      assert.deepEqual(JSON.parse(await stored(page)).removed.couples, ['Zn2+/Zn']);
      assert.match(await text(page, '#removed-couple'), /Built-in rows deleted in this workbook \(1\) Zn2\+\/Zn/);
      await page.getByRole('button', { name: 'Restore Zn2+/Zn from the built-in table' }).click();
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await cellE0(page, 'Zn2+/Zn'), builtinE0('Zn2+/Zn'));
      assert.equal(await text(page, '#removed-couple'), '');
      // Revert an edited row.
      await page.fill('#filter-couple', 'Ag+/Ag');
      await row(page, 'couple', 'Ag+/Ag').getByRole('button', { name: 'Edit Ag+/Ag' }).click();
      await fill(page, 'couple', { e0: '0.80', source: 'lab' });
      await save(page, 'couple');
      await waitIdle(page);
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      assert.equal(await cellE0(page, 'Ag+/Ag'), 0.8);
      await row(page, 'couple', 'Ag+/Ag').getByRole('button', { name: 'Revert Ag+/Ag to the built-in value' }).click();
      assert.match(await text(page, '#confirm'), /E° 0\.8 → 0\.7992 V/);
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await cellE0(page, 'Ag+/Ag'), builtinE0('Ag+/Ag'));
      assert.match(await text(page, '#in-use'), /Differ from built-in none/);
      assert.equal((await calculations(page)).length, 5); // the first opening's and one per change
    },
  },

  {
    name: 'reset: asks first (cancel changes nothing), then removes the workbook table',
    async run({ open, shot }) {
      const page = await openPane(open);
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source: 'lab' });
      const before = await stored(page);
      await page.click('#reset');
      assert.match(await text(page, '#confirm'), /Reset to the built-in table\?.*1 row that differs from the built-in table will be lost: couple Tl\+\/Tl: added/);
      await shot(page, '07-confirm-reset');
      await confirmDialog(page, false);
      assert.equal(await stored(page), before);
      await page.click('#reset');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await stored(page), null);
      assert.match(await text(page, '#in-use'), /Built-in table/);
      assert.equal((await cellE0(page, 'Tl+/Tl')).error, '#N/A');
      assert.deepEqual(await calculations(page), ['Full', 'Full', 'Full']); // the first opening's, the add, the reset
    },
  },

  {
    name: 'pin, reopen, and a newer built-in table: what would change is shown, update keeps own rows',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#pin');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.match(await notice(page), new RegExp(`Pinned: the built-in table ${BUILTIN_VERSION}`));
      const pinned = JSON.parse(await stored(page));
      assert.equal(pinned.basedOn, BUILTIN_VERSION);
      const builtinChecksum = await page.evaluate(() => globalThis.cellwrightFunctionsHost.status().checksum);
      assert.equal(pinned.checksum, builtinChecksum); // a pinned copy carries the built-in table's checksum
      await reopen(page);
      assert.match(await text(page, '#in-use'), /This workbook’s own table.*Revision 1.*Differ from built-in none/);
      // The workbook was pinned to an older built-in table in which Cu2+/Cu was 0.3377 V and Ag+/Ag was set here.
      const doc = JSON.parse(await stored(page));
      doc.basedOn = '2025.1';
      doc.couples = doc.couples.map((c) => (c.key === 'Cu2+/Cu' ? { ...c, e0: 0.3377 } : c.key === 'Ag+/Ag' ? { ...c, e0: 0.8, source: 'lab' } : c));
      doc.own.couples = ['Ag+/Ag'];
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [KEY, reseal(doc)]);
      await reopen(page);
      assert.equal(await cellE0(page, 'Cu2+/Cu'), 0.3377); // pinned values, not the add-in's
      const newer = await text(page, '#newer-builtin');
      assert.match(newer, new RegExp(`built-in table ${BUILTIN_VERSION} is newer than 2025\\.1`));
      assert.match(newer, /Updating would change 1 row: couple Cu2\+\/Cu: E° 0\.3377 → 0\.3372 V/);
      await fitsWidth(page);
      await shot(page, '08-newer-built-in-table');
      await page.click('#update-builtin');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await cellE0(page, 'Cu2+/Cu'), builtinE0('Cu2+/Cu'));
      assert.equal(await cellE0(page, 'Ag+/Ag'), 0.8);
      assert.equal(JSON.parse(await stored(page)).basedOn, BUILTIN_VERSION);
      assert.equal(await page.locator('#newer-builtin').count(), 0);
    },
  },

  {
    name: 'import with a bad line: each rejected line with its reason, nothing changes, then the valid lines on request',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#tab-files');
      const csv = [
        'row_type,key,half_reaction,other_names,potential_V,dEdT_mV_per_K,source,note',
        'couple,Tl+/Tl,Tl+ + e- -> Tl,,-0.336,,Lab 2026,',
        'couple,In3+/In,In3+ + 3e- -> In,,abc,,Lab 2026,',
        'couple,Cu2+/Cu,Cu2+ + 2e- -> Cu,,0.3521,0.011,Plant QA,"re-measured, see ""log"""',
        'electrode,Plant SCE,,plant calomel|bench SCE,0.244,-0.67,Lab 2026,',
        'couple,Ga3+/Ga,Ga3+ + 2e- -> Ga,,-0.549,,Lab 2026,',
      ].join('\n');
      await page.fill('#import-text', csv);
      await page.click('#import-check');
      const report = await text(page, '#import-report');
      assert.match(report, /3 lines accepted, 2 lines rejected/);
      assert.match(report, /Line 3: potential_V "abc" is not a number/);
      assert.match(report, /Line 6: .*charge/i);
      assert.equal(await page.locator('#import-all').count(), 0);
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'import-summary');
      await fitsWidth(page);
      await shot(page, '09-import-report-with-rejected-lines', '#import-check');
      assert.equal(await stored(page), null); // checking changed nothing
      await page.click('#import-valid');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.match(await notice(page), /Imported 2 couples and 1 electrode/);
      assert.equal(await cellE0(page, 'Tl+/Tl'), -0.336);
      assert.equal(await cellE0(page, 'Cu2+/Cu'), 0.3521);
      assert.equal((await cellE0(page, 'In3+/In')), builtinE0('In3+/In'));
      const doc = JSON.parse(await stored(page));
      assert.equal(doc.couples.find((c) => c.key === 'Cu2+/Cu').note, 're-measured, see "log"');
      assert.deepEqual(doc.electrodes.find((e) => e.key === 'Plant SCE').aliases, ['plant calomel', 'bench SCE']);
      // A file of good lines only imports with one button; replace mode asks first.
      await page.setInputFiles('#import-file', { name: 'two.csv', mimeType: 'text/csv', buffer: Buffer.from('\uFEFFkey,row_type,potential_V,source,half_reaction\r\nAg+/Ag,couple,0.7996,CRC,Ag+ + e- -> Ag\r\n') });
      await page.waitForSelector('#import-all');
      assert.match(await text(page, '#import-report'), /1 line accepted, 0 lines rejected/);
      await page.check('input[name="import-mode"][value="replace"]');
      await page.click('#import-check');
      await page.click('#import-all');
      assert.match(await text(page, '#confirm'), /Replace the whole table\?/);
      await confirmDialog(page, false);
      assert.equal(JSON.parse(await stored(page)).couples.length, doc.couples.length);
      // A file that is not in the layout is refused whole.
      await page.fill('#import-text', 'name,value\nCu,0.3521\n');
      await page.click('#import-check');
      assert.match(await text(page, '#import-report'), /cannot be imported: .*"name", "value" are not columns/);
    },
  },

  {
    name: 'export: the CSV download and the CSV text hold the table in use',
    async run({ open }) {
      const page = await openPane(open);
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source: 'Lab, "2026"' });
      await page.click('#tab-files');
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#export-download')]);
      assert.equal(download.suggestedFilename(), 'cellwright-potential-table.csv');
      const csv = readFileSync(await download.path(), 'utf8');
      assert.ok(csv.startsWith('\uFEFF# Cellwright potential table, CSV layout 1.'));
      assert.match(csv, /revision 1; checksum sha256:[0-9a-f]{64}/);
      const lines = csv.trim().split('\r\n');
      assert.equal(lines[2], 'row_type,key,half_reaction,other_names,potential_V,dEdT_mV_per_K,source,note');
      assert.ok(lines.includes('couple,Tl+/Tl,Tl+ + e- -> Tl,,-0.336,,"Lab, ""2026""",'), lines.filter((l) => l.includes('Tl+')).join('\n'));
      assert.equal(lines.filter((l) => l.startsWith('couple,')).length, couplesFile.couples.length + 1);
      await page.click('#export-show');
      assert.equal(await page.getAttribute('#export-show', 'aria-expanded'), 'true');
      const shown = await page.inputValue('#export-text');
      // A textarea gives its text with LF line ends; the rows must be the same apart from the export time.
      assert.equal(shown.split('\n').slice(2).join('\n'), csv.replace(/\r\n/g, '\n').split('\n').slice(2).join('\n'));
    },
  },

  {
    name: 'filter: by text and by "differs from built-in"',
    async run({ open, shot }) {
      const page = await openPane(open);
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source: 'lab' });
      await page.fill('#filter-couple', 'fe');
      const keys = await page.locator('#list-couple .row-key').allInnerTexts();
      assert.ok(keys.length >= 3 && keys.length < couplesFile.couples.length, `${keys.length} rows for "fe"`);
      for (const li of await page.locator('#list-couple > li').allInnerTexts()) assert.match(li.toLowerCase(), /fe/);
      assert.match(await text(page, '#count-couple'), new RegExp(`^${keys.length} of ${couplesFile.couples.length + 1} couples match\\.`));
      await page.fill('#filter-couple', 'Thermoddem');
      assert.ok((await page.locator('#list-couple > li').count()) > 10); // matches sources too
      await page.fill('#filter-couple', '');
      await page.check('#only-diff-couple');
      assert.deepEqual(await page.locator('#list-couple .row-key').allInnerTexts(), ['Tl+/Tl']);
      await shot(page, '10-filter-differing-rows', '.tabs');
      await page.uncheck('#only-diff-couple');
      await page.click('#tab-electrodes');
      await page.fill('#filter-electrode', 'calomel');
      const el = await page.locator('#list-electrode .row-key').allInnerTexts();
      assert.ok(el.length >= 1 && el.includes('SCE'), el.join(', '));
    },
  },

  {
    name: 'keyboard only: tabs with arrow keys, add a couple, confirm with the keyboard, Escape cancels',
    async run({ open, shot }) {
      const page = await openPane(open);
      // From the top of the page, Tab until the "Add couple" button has focus.
      await page.evaluate(() => document.activeElement?.blur());
      let found = false;
      for (let i = 0; i < 30 && !found; i++) {
        await page.keyboard.press('Tab');
        found = await page.evaluate(() => document.activeElement?.id === 'add-couple');
      }
      assert.ok(found, 'Tab reaches Add couple');
      await page.keyboard.press('Enter');
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'f-couple-halfReaction');
      await page.keyboard.type('Ga3+ + 3e- -> Ga');
      await page.keyboard.press('Tab');
      await page.keyboard.type('Ga3+/Ga');
      await page.keyboard.press('Tab');
      await page.keyboard.type('-0.549');
      await page.keyboard.press('Tab');
      await page.keyboard.press('Tab');
      await page.keyboard.type('CRC Handbook, 92nd ed.');
      await page.keyboard.press('Tab'); // note
      await page.keyboard.press('Tab');
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'f-couple-by'); // the name, asked once
      await page.keyboard.type('K. Board');
      await page.keyboard.press('Tab');
      assert.equal(await page.isDisabled('#save-couple'), true); // Save waits for a reason
      await page.keyboard.type('gallium strike bath added');
      assert.equal(await page.isDisabled('#save-couple'), false);
      await shot(page, '11-keyboard-entry', '#editor-couple');
      await page.keyboard.press('Enter'); // submits the form
      await waitIdle(page);
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      assert.equal(await cellE0(page, 'Ga3+/Ga'), -0.549);
      assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Edit Ga3+/Ga');
      // Tab to the row's Delete button and confirm with the keyboard; Escape first cancels.
      await page.keyboard.press('Tab');
      assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Delete Ga3+/Ga');
      await page.keyboard.press('Enter');
      await page.waitForSelector('dialog#confirm[open]');
      await page.keyboard.press('Escape');
      await page.waitForSelector('dialog#confirm', { state: 'hidden' });
      assert.equal(await page.evaluate(() => document.activeElement?.getAttribute('aria-label')), 'Delete Ga3+/Ga'); // focus returns
      await page.keyboard.press('Enter');
      await page.waitForSelector('dialog#confirm[open]');
      // The name is remembered now: only the reason is asked, and it has focus.
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'confirm-why');
      assert.equal(await page.isVisible('#confirm-by'), false);
      assert.match(await text(page, '#confirm'), /Recorded as K\. Board/);
      await page.keyboard.type('added by mistake');
      await page.keyboard.press('Tab'); // from the reason to Delete
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'confirm-ok');
      await page.keyboard.press('Enter');
      await waitIdle(page);
      assert.equal((await cellE0(page, 'Ga3+/Ga')).error, '#N/A');
      // Tabs: focus the selected tab, arrows move between sections.
      await page.focus('#tab-couples');
      await page.keyboard.press('ArrowRight');
      assert.equal(await page.getAttribute('#tab-electrodes', 'aria-selected'), 'true');
      assert.equal(await page.isVisible('#panel-electrodes'), true);
      await page.keyboard.press('End');
      assert.equal(await page.getAttribute('#tab-about', 'aria-selected'), 'true');
      await page.keyboard.press('ArrowRight');
      assert.equal(await page.getAttribute('#tab-couples', 'aria-selected'), 'true');
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'tab-couples');
    },
  },

  {
    name: 'hostile text is shown as text, never run: in rows, in the import report, in the sheet copy',
    async run({ open, shot }) {
      const page = await openPane(open);
      const source = '<img src=x onerror="window.__pwned=1">';
      const note = '<script>window.__pwned=2</script><b>bold?</b>';
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source, note });
      await page.click('#tab-electrodes');
      await page.click('#add-electrode');
      await fill(page, 'electrode', { key: '<img src=y onerror=window.__pwned=3>', aliases: '=HYPERLINK("http://example.invalid","x")', potential: '0.2', source: '"><svg onload=window.__pwned=4>' });
      await save(page, 'electrode');
      await waitIdle(page);
      await page.waitForSelector('#editor-electrode', { state: 'hidden' });
      await page.click('#tab-couples');
      await page.fill('#filter-couple', 'Tl+');
      const li = await row(page, 'couple', 'Tl+/Tl').innerText();
      assert.ok(li.includes(`Source: ${source}`) && li.includes(`Note: ${note}`), li);
      const injected = await page.evaluate(() => ({
        pwned: window.__pwned ?? null,
        elements: document.querySelectorAll('main img, main script, main svg:not(.eph-svg), main b').length,
      }));
      assert.deepEqual(injected, { pwned: null, elements: 0 });
      await shot(page, '12-hostile-text-shown-as-text', '#list-couple');
      await page.click('#tab-electrodes');
      assert.ok((await page.locator('#list-electrode').innerText()).includes('<img src=y onerror=window.__pwned=3>'));
      // In the import report.
      await page.click('#tab-files');
      await page.fill('#import-text', 'row_type,key,potential_V,source\ncouple,<iframe src=javascript:window.__pwned=5>,1,x\n');
      await page.click('#import-check');
      assert.ok((await text(page, '#import-rejected')).includes('<iframe src=javascript:window.__pwned=5>'));
      // In the sheet copy: text cells are text, none becomes a formula.
      await page.click('#copy-sheet');
      assert.match(await notice(page), /Copied the table to the new sheet “Potential table”/);
      const sheet = (await page.evaluate(() => window.__stubWorkbook.file().sheets))['Potential table'];
      const main = sheet.writes.find((w) => w.values);
      assert.equal(main.formulas, 0);
      assert.ok(main.values.some((r) => r[1] === '=HYPERLINK("http://example.invalid","x")'));
      assert.deepEqual(await page.evaluate(() => ({ pwned: window.__pwned ?? null, frames: document.querySelectorAll('iframe').length })), { pwned: null, frames: 0 });
    },
  },

  {
    name: 'an unreadable stored table: the problem is shown, functions answer #N/A, raw text exported, reset only on request',
    async run({ open, shot }) {
      const page = await openPane(open);
      const raw = '{"format":"cellwright.potential-table","schema":2,"basedOn":"2026.1","couples":[{"key":"Cu2+/Cu"';
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [KEY, raw]);
      await reopen(page);
      const card = await text(page, '#in-use');
      assert.match(card, /This workbook’s table cannot be read/);
      assert.match(card, /not valid JSON/);
      assert.match(card, /Nothing has been changed or replaced/);
      assert.match(card, /Worksheet functions: answer #N\/A/);
      // Plain words in view; the JSON reader's own text only inside the closed "Details" disclosure.
      assert.doesNotMatch(await text(page, '#unreadable-reason'), /position|Expected|Unexpected/);
      assert.deepEqual(
        await page.evaluate(() => {
          const d = document.querySelector('#unreadable-details');
          return { open: d?.open, summary: d?.querySelector('summary')?.textContent, body: d?.textContent ?? '' };
        }).then((d) => ({ ...d, body: /JSON reader:/.test(d.body) })),
        { open: false, summary: 'Details', body: true },
      );
      const cell = await cellE0(page, 'Cu2+/Cu');
      assert.equal(cell.error, '#N/A');
      assert.match(cell.message, /^the workbook's potential table could not be read: the stored table is not valid JSON/);
      assert.equal(await page.isDisabled('#add-couple'), true);
      await fitsWidth(page);
      await shot(page, '13-unreadable-table');
      const [download] = await Promise.all([page.waitForEvent('download'), page.click('#raw-download')]);
      assert.equal(readFileSync(await download.path(), 'utf8'), raw);
      await page.click('#raw-show');
      assert.equal(await page.inputValue('#raw-text'), raw);
      assert.equal(await stored(page), raw); // still there, untouched
      await page.click('#reset');
      assert.match(await text(page, '#confirm'), /cannot be read.*removes it for good/);
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await stored(page), null);
      assert.equal(await cellE0(page, 'Cu2+/Cu'), builtinE0('Cu2+/Cu'));
      assert.match(await text(page, '#in-use'), /Built-in table/);
    },
  },

  {
    name: 'a stored table holding a number beyond double range opens as unreadable, with download and reset (not only "read again")',
    async run({ open }) {
      const page = await openPane(open);
      await page.click('#pin');
      await confirmDialog(page, true);
      await waitIdle(page);
      const raw = (await stored(page)).replace(/"e0":0\.3372/, '"e0":1e999');
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [KEY, raw]);
      await reopen(page);
      const card = await text(page, '#in-use');
      assert.match(card, /This workbook’s table cannot be read/);
      assert.match(card, /not a finite number/);
      assert.equal(await page.isVisible('#raw-download'), true);
      assert.equal(await page.isVisible('#reset'), true);
      const cell = await cellE0(page, 'Cu2+/Cu');
      assert.equal(cell.error, '#N/A');
    },
  },

  {
    name: 'copy to sheet: the table with version, checksum and sources on a new sheet',
    async run({ open }) {
      const page = await openPane(open);
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source: 'lab' });
      await page.click('#tab-files');
      await page.click('#copy-sheet');
      assert.match(await notice(page), /Potential table/);
      await page.click('#copy-sheet');
      await page.waitForFunction(() => /Potential table \(2\)/.test(document.getElementById('notice')?.textContent ?? ''));
      const sheets = await page.evaluate(() => window.__stubWorkbook.file().sheets);
      assert.deepEqual(Object.keys(sheets), ['Potential table', 'Potential table (2)']);
      assert.equal(sheets['Potential table (2)'].active, true);
      const v = sheets['Potential table'].writes.find((w) => w.values).values;
      const checksum = JSON.parse(await stored(page)).checksum;
      assert.deepEqual(v[3].slice(0, 2), ['Checksum', checksum]);
      assert.match(v[1][1], /own table, based on built-in .*revision 1/);
      const tl = v.find((r) => r[0] === 'Tl+/Tl');
      assert.deepEqual(tl.slice(0, 6), ['Tl+/Tl', 'Tl+ + e- -> Tl', 1, -0.336, '', 'lab']);
      assert.equal(v.filter((r) => typeof r[3] === 'number').length >= couplesFile.couples.length + 1, true);
    },
  },

  {
    name: 'changes made elsewhere: the functions follow, the pane says so, and a stale save is stopped and can be re-applied',
    async run({ open, shot }) {
      const page = await openPane(open);
      await addCouple(page, { halfReaction: 'Tl+ + e- -> Tl', key: 'Tl+/Tl', e0: '-0.336', source: 'pane A' });
      // A co-author changes Ag+/Ag (revision 2): the settings event reaches the functions.
      const doc = JSON.parse(await stored(page));
      doc.revision = 2;
      doc.couples = doc.couples.map((c) => (c.key === 'Ag+/Ag' ? { ...c, e0: 0.81, source: 'co-author' } : c));
      doc.own.couples = [...doc.own.couples, 'Ag+/Ag'];
      await page.evaluate(([k, v]) => window.__stubWorkbook.writeElsewhere(k, v), [KEY, reseal(doc)]);
      await page.waitForFunction(async () => (await window.__stubWorkbook.call('STDPOTENTIAL', [['Ag+/Ag']], null)) === 0.81);
      // This pane has not noticed yet; saving now must not overwrite the co-author's row.
      await page.fill('#filter-couple', 'Cu2+/Cu');
      await row(page, 'couple', 'Cu2+/Cu').getByRole('button', { name: 'Edit Cu2+/Cu' }).click();
      await fill(page, 'couple', { e0: '0.35', source: 'pane A' });
      await save(page, 'couple');
      await waitIdle(page);
      const msg = await notice(page);
      assert.match(msg, /Not saved: this workbook’s table was changed elsewhere/);
      assert.match(msg, /couple Ag\+\/Ag: E° 0\.7992 → 0\.81 V, source/);
      assert.match(await text(page, '#f-couple-form-error'), /Save again/);
      assert.equal(JSON.parse(await stored(page)).revision, 2);
      await fitsWidth(page);
      await shot(page, '14-conflict-changed-elsewhere', '#notice');
      await page.getByRole('button', { name: 'Apply my change to the latest table' }).click();
      await waitIdle(page);
      await page.waitForFunction(() => /Saved couple Cu2\+\/Cu/.test(document.getElementById('notice')?.textContent ?? ''));
      const now = JSON.parse(await stored(page));
      assert.equal(now.revision, 3);
      assert.equal(await cellE0(page, 'Ag+/Ag'), 0.81);
      assert.equal(await cellE0(page, 'Cu2+/Cu'), 0.35);
      assert.equal(await cellE0(page, 'Tl+/Tl'), -0.336);
      // Another change elsewhere is noticed when the pane gets focus again.
      now.revision = 4;
      now.couples = now.couples.filter((c) => c.key !== 'Tl+/Tl');
      now.own.couples = now.own.couples.filter((k) => k !== 'Tl+/Tl');
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [KEY, reseal(now)]);
      await page.evaluate(() => window.dispatchEvent(new Event('focus')));
      await page.waitForFunction(() => /changed elsewhere/.test(document.getElementById('notice')?.textContent ?? '') && /Tl\+\/Tl: removed/.test(document.getElementById('notice')?.textContent ?? ''));
      assert.match(await text(page, '#in-use'), /Revision 4/);
      assert.equal((await cellE0(page, 'Tl+/Tl')).error, '#N/A');
    },
  },

  {
    name: '2,000 rows: imported, listed with a cap, filtered, and read back after reopening',
    async run({ open, shot }) {
      const page = await openPane(open);
      const lines = ['row_type,key,half_reaction,potential_V,source'];
      for (let k = 1; k <= 2000; k++) lines.push(`couple,C${k}H${2 * k}O/C${k}H${2 * k + 2}O,C${k}H${2 * k}O + 2H+ + 2e- -> C${k}H${2 * k + 2}O,${((k % 300) / 100 - 1.5).toFixed(2)},Synthetic row for the size test`);
      await page.click('#tab-files');
      await page.setInputFiles('#import-file', { name: 'big.csv', mimeType: 'text/csv', buffer: Buffer.from(lines.join('\n')) });
      await page.waitForSelector('#import-all');
      assert.match(await text(page, '#import-report'), /2,000 lines accepted, 0 lines rejected/);
      await page.click('#import-all');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.match(await notice(page), /Imported 2000 couples/);
      const size = (await stored(page)).length;
      assert.ok(size > 200_000 && size < 2_000_000, `${size} characters`);
      await reopen(page);
      await page.click('#tab-couples');
      assert.match(await text(page, '#count-couple'), new RegExp(`^${(couplesFile.couples.length + 2000).toLocaleString('en-US')} couples\\. Showing the first 200`));
      assert.equal(await page.locator('#list-couple > li').count(), 200);
      await page.fill('#filter-couple', 'C1999H');
      assert.deepEqual(await page.locator('#list-couple .row-key').allInnerTexts(), ['C1999H3998O/C1999H4000O']);
      assert.equal(await cellE0(page, 'C2000H4000O/C2000H4002O'), Number(((2000 % 300) / 100 - 1.5).toFixed(2)));
      await shot(page, '15-two-thousand-rows-filtered', '.tabs');
    },
  },
  {
    name: 'verification sheet: one row per published case with live formulas, every case PASS with the built-in table, printed one page wide',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#tab-files');
      await page.click('#write-verification');
      await page.waitForFunction(() => /Wrote the sheet/.test(document.getElementById('verification-status')?.textContent ?? ''));
      const cases = JSON.parse(readFileSync(resolve(root, 'data/verification.json'), 'utf8')).cases;
      assert.match(await text(page, '#verification-status'), new RegExp(`Wrote the sheet “Verification” with ${cases.length} cases`));
      await fitsWidth(page);
      await shot(page, '16-verification-written', '#write-verification');
      const sheet = (await page.evaluate(() => window.__stubWorkbook.file().sheets)).Verification;
      assert.ok(sheet.active);
      assert.equal(sheet.orientation, 'Landscape');
      assert.deepEqual(sheet.zoom, { horizontalFitToPages: 1, verticalFitToPages: 0 });
      assert.match(sheet.printTitleRows, /^\$\d+:\$\d+$/);
      const main = sheet.writes.find((w) => w.values);
      assert.equal(main.formulas, cases.length * 2 + 6); // a live formula and a check per case; 6 in the header
      // The written cells, recalculated outside the browser by the same engine as `cellwright check`
      // (the add-in's functions through the production bundle, the rest through the formula engine).
      const wb = new ExcelJS.Workbook();
      const ws = wb.addWorksheet('Verification');
      main.values.forEach((row, i) =>
        row.forEach((v, j) => {
          if (v === '') return;
          const cell = ws.getCell(i + 1, j + 1);
          cell.value = typeof v === 'string' && v.startsWith('=') && main.numberFormat[i][j] !== '@' ? { formula: v.slice(1) } : v;
        }),
      );
      const report = await checkWorkbook(Buffer.from(await wb.xlsx.writeBuffer()), { collect: true });
      assert.deepEqual(report.notEvaluable, []);
      const at = (a) => report.values.get(`Verification!${a}`);
      const header = main.values.findIndex((r) => r[0] === 'Case');
      const rows = [];
      for (let i = header + 1; i < main.values.length; i++) {
        const r = i + 1;
        rows.push({ id: main.values[i][0], result: at(`D${r}`), check: at(`H${r}`) });
      }
      assert.equal(rows.length, cases.length);
      for (const r of rows) assert.equal(r.check, 'PASS', `${r.id}: ${JSON.stringify(r.result)}`);
      const label = (name) => at(`C${main.values.findIndex((r) => r[1] === name) + 1}`);
      assert.equal(label('Result'), `PASS: all ${cases.length} cases`);
      assert.equal(label('Potential table'), 'built-in');
      assert.equal(label('Table version'), BUILTIN_VERSION);
      assert.match(label('Table checksum'), /^sha256:[0-9a-f]{64}$/);
      assert.equal(label('Add-in version'), JSON.parse(readFileSync(resolve(root, 'package.json'), 'utf8')).version);
      assert.equal(label('Table changed'), 'not stored (the built-in table)');
      // A picture of the sheet as written and calculated (the stub has no grid of its own to show).
      const esc = (x) => String(x).replace(/&/g, '&amp;').replace(/</g, '&lt;');
      const shown = (v) => (v === null || v === undefined ? '' : typeof v === 'object' && 'error' in v ? v.error : typeof v === 'number' ? String(Number(v.toPrecision(10))) : String(v));
      const body = main.values
        .map((row, i) => `<tr>${row.map((v, j) => {
          const isFormula = typeof v === 'string' && v.startsWith('=') && main.numberFormat[i][j] !== '@';
          const value = isFormula ? shown(at(`${String.fromCharCode(65 + j)}${i + 1}`)) : shown(v);
          const cls = value === 'PASS' || /^PASS:/.test(value) ? 'pass' : value === 'FAIL' ? 'fail' : '';
          return `<td class="${cls}${j >= 8 ? ' wrap' : ''}" title="${esc(v)}">${esc(value)}</td>`;
        }).join('')}</tr>`)
        .join('');
      await page.setViewportSize({ width: 1400, height: 1600 });
      await page.goto('about:blank'); // a plain page of our own: the pane's content policy forbids inline styles
      // column widths as the pane set them (points), so the picture has the printed proportions
      const px = sheet.writes.filter((w) => typeof w.columnWidth === 'number').map((w) => Math.round(w.columnWidth * 1.1));
      const widths = px.map((w) => `<col style="width:${w}px">`).join('');
      const total = px.reduce((a, b) => a + b, 0);
      await page.setContent(`<style>body{font:10px Calibri,Arial,sans-serif;margin:8px}table{border-collapse:collapse;table-layout:fixed;width:${total}px}td{border:1px solid #d0d0d0;padding:1px 3px;vertical-align:top;white-space:nowrap;overflow:hidden}td.wrap{white-space:normal}td.pass{background:#e3f1e3;font-weight:bold}td.fail{background:#f6d5d5;font-weight:bold}</style><table><colgroup>${widths}</colgroup>${body}</table>`);
      await shot(page, '17-verification-sheet-calculated');
    },
  },
  {
    name: 'E–pH: three couples at 25 °C and 80 °C, readout equals HALFCELL, flat beside sloped, written to a sheet with a chart',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#tab-eph');
      await page.waitForSelector('#eph-figure svg');
      const paths = await page.locator('#eph-figure svg path').evaluateAll((ps) => ps.map((p) => p.getAttribute('data-couple')));
      assert.deepEqual(paths, ['O2/H2O', 'H+/H2', 'Cu2+/Cu', 'Fe3+/Fe2+', 'O2/OH-']);
      const labels = await page.locator('#eph-figure svg .eph-label').evaluateAll((ts) => ts.map((t) => t.textContent));
      assert.deepEqual(labels, ['O₂ evolution', 'H₂ evolution', 'Cu2+/Cu', 'Fe3+/Fe2+', 'O2/OH-']);
      // the readout at pH 7 equals the worksheet function with the same arguments
      const read = async (key) => Number(/: (-?\d+\.\d+) V/.exec(await page.locator(`#eph-readout li[data-couple="${key}"]`).innerText())[1]);
      const cu25 = await page.evaluate(() => window.__stubWorkbook.call('HALFCELL', [['Cu2+/Cu']], [[1e-6]], [[1]], [[7]], [[25]]));
      assert.equal(await read('Cu2+/Cu'), Number(cu25.toFixed(4)));
      const o2 = await page.evaluate(() => window.__stubWorkbook.call('HALFCELL', [['O2/H2O']], [[1]], [[1]], [[7]], [[25]]));
      assert.equal(await read('O2/H2O'), Number(o2.toFixed(4)));
      await fitsWidth(page);
      await shot(page, '20-eph-three-couples-25C', '#eph-figure');
      await page.fill('#eph-temperature', '80');
      await page.dispatchEvent('#eph-temperature', 'change');
      await page.waitForFunction(() => /80 °C/.test(document.querySelector('#eph-figure svg title')?.textContent ?? ''));
      const cu80 = await page.evaluate(() => window.__stubWorkbook.call('HALFCELL', [['Cu2+/Cu']], [[1e-6]], [[1]], [[7]], [[80]]));
      assert.equal(await read('Cu2+/Cu'), Number(cu80.toFixed(4)));
      assert.notEqual(cu80, cu25);
      await shot(page, '21-eph-three-couples-80C', '#eph-figure');
      // a flat couple (Cu2+/Cu) beside a sloped one (MnO4-/Mn2+) at 25 °C
      await page.fill('#eph-temperature', '25');
      await page.dispatchEvent('#eph-temperature', 'change');
      for (const k of ['Fe3+/Fe2+', 'O2/OH-']) await page.locator(`#eph-couples input[value="${k}"]`).uncheck();
      await page.locator('#eph-couples input[value="MnO4-/Mn2+"]').check();
      const rows = await page.locator('#eph-table tbody tr').evaluateAll((trs) => trs.map((tr) => [...tr.children].map((c) => c.textContent)));
      assert.equal(rows.length, 29);
      assert.equal(rows[0][1], rows[28][1]); // Cu2+/Cu: the same at pH 0 and 14
      assert.ok(Number(rows[0][2]) - Number(rows[28][2]) > 1.2); // MnO4-/Mn2+ falls 8/5 × 0.059 V per pH
      await shot(page, '22-eph-flat-beside-sloped', '#eph-figure');
      await page.click('#eph-write');
      await page.waitForFunction(() => /Wrote/.test(document.getElementById('eph-status')?.textContent ?? ''));
      const sheet = (await page.evaluate(() => window.__stubWorkbook.file())).sheets['E-pH'];
      assert.equal(sheet.charts.length, 1);
      assert.deepEqual(sheet.charts[0], { type: 'XYScatterLines', source: 'A1:E30', seriesBy: 'Columns', title: 'E–pH at 25 °C, dissolved species at activity 0.000001, gases at 1 bar' });
      const w = sheet.writes[0];
      assert.equal(w.address, 'A1:E30');
      assert.equal(w.values[1][1], '=CELLWRIGHT.HALFCELL("Cu2+/Cu",0.000001,1,A2,25)');
      assert.equal(w.formulas, 4 * 29);
    },
  },

  {
    name: 'E–pH: keyboard only, and an unreadable table says why and draws nothing',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.focus('#tab-couples');
      for (let i = 0; i < 3; i++) await page.keyboard.press('ArrowRight');
      assert.equal(await page.evaluate(() => document.activeElement?.id), 'tab-eph');
      await page.waitForSelector('#eph-figure svg');
      await page.focus('#eph-ph');
      await page.keyboard.press('ArrowRight');
      await page.keyboard.press('ArrowRight');
      await page.waitForFunction(() => /At pH 8:/.test(document.getElementById('eph-readout')?.textContent ?? ''));
      const x = await page.locator('#eph-figure svg .eph-cursor').getAttribute('x1');
      assert.equal(Number(x), Number((56 + (8 / 14) * (560 - 56 - 112)).toFixed(1)));
      await shot(page, '23-eph-keyboard-readout-pH8', '#eph-ph');
      const raw = '{"format":"cellwright.potential-table","schema":2';
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [KEY, raw]);
      await reopen(page);
      await page.click('#tab-eph');
      assert.match(await text(page, '#eph-why'), /cannot be read/);
      assert.equal(await page.locator('#eph-figure svg').count(), 0);
      assert.equal(await page.isDisabled('#eph-write'), true);
      await shot(page, '24-eph-unreadable-table', '#eph-figure');
    },
  },
  {
    name: 'Consistency: the built-in table’s differences over 5 mV with their explanations; an edited row without one',
    async run({ open, shot }) {
      const notes = JSON.parse(readFileSync(resolve(root, 'data/consistency.json'), 'utf8')).notes;
      const page = await openPane(open);
      await page.click('#consistency > summary');
      await page.waitForSelector('#consistency-list li');
      assert.match(await text(page, '#consistency-summary'), new RegExp(`^${Object.keys(notes).length} of \\d+ checks differ by more than 5 mV; each has an explanation on file\\.$`));
      const items = await page.locator('#consistency-list > li').evaluateAll((lis) => lis.map((li) => li.textContent));
      assert.equal(items.length, Object.keys(notes).length);
      const li = items.find((t) => t.startsWith('Li+/Li against its species-derived E°'));
      assert.ok(li.includes(notes['Li+/Li']), li);
      assert.equal(await page.locator('#consistency-list .unexplained').count(), 0);
      await fitsWidth(page);
      await shot(page, '27-consistency-built-in', '#consistency');
      // the workbook's copy with Cu2+/Cu at 0.40 V: reported against its species data, with no explanation
      await page.fill('#filter-couple', 'Cu2+/Cu');
      await row(page, 'couple', 'Cu2+/Cu').getByRole('button', { name: 'Edit Cu2+/Cu' }).click();
      await fill(page, 'couple', { e0: '0.40', source: 'edited for the test' });
      await save(page, 'couple');
      await waitIdle(page);
      await page.waitForFunction(() => /Cu2\+\/Cu against its species-derived E°/.test(document.getElementById('consistency-list')?.textContent ?? ''));
      // two lines: the row against its species data, and the cycle Cu2+/Cu = Cu2+/Cu+ + Cu+/Cu
      assert.match(await text(page, '#consistency-summary'), /2 without an explanation on file/);
      assert.match(await text(page, '#consistency-list'), /Cu2\+\/Cu against Cu2\+\/Cu\+ and Cu\+\/Cu \(a cycle\)/);
      const cu = (await page.locator('#consistency-list > li').evaluateAll((lis) => lis.map((x) => x.textContent))).find((t) => t.startsWith('Cu2+/Cu against its species-derived E°'));
      // NBS 1982: ΔfG°(Cu2+) = 65.49 kJ/mol, E° = 65490/(2 × 96485.33212) = 0.3394 V; 0.40 V is +60.6 mV above it
      assert.match(cu, /: \+60\.6 mV/);
      assert.match(cu, /No explanation on file/);
      await shot(page, '28-consistency-edited-row', '#consistency');
    },
  },
  {
    name: 'revision log: a save asks for a reason (and the name once), the log shows what/who/when/why, Copy to sheet and CSV carry it',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.fill('#filter-couple', 'Cu2+/Cu');
      await row(page, 'couple', 'Cu2+/Cu').getByRole('button', { name: 'Edit Cu2+/Cu' }).click();
      await page.fill('#f-couple-e0', '0.35');
      await page.fill('#f-couple-source', 'Plant QA measurement, bath 4, 2026-11');
      // Nothing is saved without a reason: Save stays disabled, the name is asked because none is remembered.
      assert.equal(await page.isDisabled('#save-couple'), true);
      assert.equal(await page.isVisible('#f-couple-by'), true);
      await labelled(page);
      await fitsWidth(page);
      await shot(page, '25-save-asks-for-a-reason', '#editor-couple');
      await page.fill('#f-couple-by', 'Q. Engineer');
      assert.equal(await page.isDisabled('#save-couple'), true); // a name alone is not enough
      await page.fill('#f-couple-why', 'bath 4 re-measured against the plant SCE');
      assert.equal(await page.isDisabled('#save-couple'), false);
      await page.click('#save-couple');
      await waitIdle(page);
      await page.waitForSelector('#editor-couple', { state: 'hidden' });
      // A second change with a reason that would be a formula in a spreadsheet.
      await page.fill('#filter-couple', 'Zn');
      await row(page, 'couple', 'Zn2+/Zn').getByRole('button', { name: 'Delete Zn2+/Zn' }).click();
      await page.waitForSelector('dialog#confirm[open]');
      assert.equal(await page.isVisible('#confirm-by'), false); // the name is asked once
      await confirmDialog(page, true, '=HYPERLINK("http://example.invalid","x"),+1 not used on this line');
      await waitIdle(page);
      const doc = JSON.parse(await stored(page));
      assert.equal(doc.schema, 3);
      assert.deepEqual(doc.log.entries.map((e) => [e.revision, e.action, e.by]), [[1, 'edit', 'Q. Engineer'], [2, 'delete', 'Q. Engineer']]);
      assert.deepEqual(doc.log.entries[0].rows[0].fields[0], { field: 'e0', from: builtinE0('Cu2+/Cu'), to: 0.35 });
      // The Log tab: newest first, what, who, when, why.
      await page.click('#tab-log');
      const items = page.locator('#log-list > li');
      assert.equal(await items.count(), 2);
      const newest = (await items.nth(0).innerText()).replace(/\s+/g, ' ');
      assert.match(newest, new RegExp(`^Revision 2 · .* · Q\\. Engineer Deleted a row\\. couple Zn2\\+/Zn removed \\(was: .*E° ${builtinE0('Zn2+/Zn')} V.*\\) Why: =HYPERLINK\\("http://example\\.invalid","x"\\),\\+1 not used on this line UTC 20\\d\\d-`));
      const oldest = (await items.nth(1).innerText()).replace(/\s+/g, ' ');
      assert.match(oldest, new RegExp(`^Revision 1 · .* · Q\\. Engineer Edited a row\\. couple Cu2\\+/Cu: E° ${builtinE0('Cu2+/Cu')} V → 0\\.35 V; source “.*” → “Plant QA measurement, bath 4, 2026-11” Why: bath 4 re-measured against the plant SCE`));
      assert.match(await text(page, '#log-summary'), /^2 entries, newest first\./);
      await labelled(page);
      await fitsWidth(page);
      await shot(page, '26-revision-log', '#panel-log');
      // The name given once shows here and can be changed later.
      assert.equal(await page.inputValue('#log-name'), 'Q. Engineer');
      await page.fill('#log-name', 'Q. Engineer (QA)');
      await page.click('#log-name-save');
      assert.match(await text(page, '#log-name-status'), /recorded as Q\. Engineer \(QA\)/);
      // Copy to sheet writes the log after the rows, every text cell as text.
      await page.click('#log-copy-sheet');
      assert.match(await notice(page), /Copied the table to the new sheet/);
      const sheet = (await page.evaluate(() => window.__stubWorkbook.file().sheets))['Potential table'];
      const main = sheet.writes.find((w) => w.values);
      assert.equal(main.formulas, 0);
      const head = main.values.findIndex((r) => r[0] === 'Revision log');
      assert.ok(head > 0, 'the sheet has a Revision log section');
      assert.deepEqual([main.values[head + 2][0], main.values[head + 2][6], main.values[head + 2][7]], [2, '=HYPERLINK("http://example.invalid","x"),+1 not used on this line', 'Q. Engineer']);
      // The CSV export carries the log as comment lines, guarded piece by piece.
      await page.click('#tab-files');
      await page.click('#export-show');
      const csv = await page.inputValue('#export-text');
      const logLines = csv.split(/\r?\n/).filter((l) => l.startsWith('# Revision'));
      assert.equal(logLines.length, 3); // the heading and two entries
      assert.ok(logLines.some((l) => l.includes(`'+1 not used on this line`)), logLines.join('\n'));
      for (const l of logLines) for (const piece of l.split(/[,;\t]/)) assert.doesNotMatch(piece.trimStart(), /^[=+\-@"]/, l);
      // Reopened, the log is still there and reads.
      await reopen(page);
      await page.click('#tab-log');
      assert.equal(await page.locator('#log-list > li').count(), 2);
    },
  },
  {
    name: 'data-set view: built-in parts, then the whole data set pinned; reopened it stays pinned',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#tab-data');
      assert.match(await text(page, '#data-set-body'), new RegExp(`Data set ${BUILTIN_VERSION} \\(built-in: follows the add-in\\)`));
      assert.equal(await page.locator('#data-parts > li').count(), 10);
      assert.equal(await page.locator('#data-parts .tag.pinned').count(), 0);
      const status = await page.evaluate(() => globalThis.cellwrightFunctionsHost.status());
      assert.equal(await page.getAttribute('#data-set-checksum', 'title'), status.dataset.checksum); // full checksum on hover
      assert.match(await text(page, '#data-set-checksum'), /^sha256:[0-9a-f]{12}…$/);
      assert.match(await text(page, '#data-parts li[data-part="atomicweights"]'), /Atomic weights built-in Version .* 84 rows .*Read-only\. Source: IUPAC/);
      await fitsWidth(page);
      await labelled(page);
      await shot(page, '29-data-set-built-in', '#tab-data');
      await page.click('#pin-data-set');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.match(await notice(page), /Pinned: the built-in table .* reference data .* is now stored in this workbook/);
      const pinned = JSON.parse(await page.evaluate((k) => window.__stubWorkbook.file().settings[k], DATA_KEY));
      assert.equal(pinned.format, 'cellwright.pinned-data');
      assert.deepEqual(Object.keys(pinned.parts), ['atomicweights', 'species', 'debyehuckel', 'water', 'electrolysis', 'units', 'anodes', 'cpcriteria', 'galvanicseries']);
      assert.deepEqual(pinned.parts.atomicweights.content, atomicWeightsFile);
      assert.notEqual(await stored(page), null);
      assert.match(await text(page, '#data-set-body'), /\(pinned in this workbook\)/);
      assert.equal(await page.locator('#data-parts .tag.pinned').count(), 10);
      // A pinned copy of the built-in data has the built-in data set's checksum.
      assert.equal(await page.getAttribute('#data-set-checksum', 'title'), status.dataset.checksum);
      assert.ok(Math.abs((await plateNi(page)) - plateMinutes(NI)) < 1e-9);
      await shot(page, '30-data-set-pinned', '#tab-data');
      await reopen(page);
      await page.click('#tab-data');
      assert.equal(await page.locator('#data-parts .tag.pinned').count(), 10);
      assert.deepEqual((await page.evaluate(() => globalThis.cellwrightFunctionsHost.status())).dataset.pinned.length, 10);
    },
  },

  {
    name: 'pinned data and a newer built-in data set that changes an atomic weight: the change is shown, results stay until updated',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#pin');
      await confirmDialog(page, true);
      await waitIdle(page);
      // The workbook was pinned with an older data set in which nickel weighed 58.6934 g/mol (an earlier IUPAC value, from memory).
      const doc = JSON.parse(await page.evaluate((k) => window.__stubWorkbook.file().settings[k], DATA_KEY));
      doc.version = '2025.1';
      doc.parts.atomicweights.content.version = '2025.1';
      doc.parts.atomicweights.content.elements.find((e) => e.symbol === 'Ni').atomicWeight = 58.6934;
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [DATA_KEY, resealData(doc)]);
      await reopen(page);
      assert.ok(Math.abs((await plateNi(page)) - plateMinutes(58.6934)) < 1e-9); // the pinned weight, not the add-in's
      await page.click('#tab-data');
      const newer = await text(page, '#newer-data');
      assert.match(newer, new RegExp(`built-in data ${BUILTIN_VERSION} is newer than 2025\\.1`));
      assert.match(newer, /Updating would change 1 part: Atomic weights Ni: atomicWeight: 58\.6934 → 58\.693 version: 2025\.1 → 2026\.1 Until/);
      assert.match(await text(page, '#data-parts li[data-part="atomicweights"]'), /pinned Version 2025\.1/);
      await fitsWidth(page);
      await shot(page, '31-newer-built-in-data-atomic-weight', '#tab-data');
      await page.click('#update-data');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.match(await notice(page), new RegExp(`Updated: the workbook’s pinned reference data is now the add-in’s ${BUILTIN_VERSION}`));
      assert.ok(Math.abs((await plateNi(page)) - plateMinutes(NI)) < 1e-9);
      assert.equal(await page.locator('#newer-data').count(), 0);
    },
  },

  {
    name: 'damaged pinned data: the data set is unreadable, functions answer #N/A with the reason, nothing is overwritten',
    async run({ open, shot }) {
      const page = await openPane(open);
      await page.click('#pin');
      await confirmDialog(page, true);
      await waitIdle(page);
      const damaged = (await page.evaluate((k) => window.__stubWorkbook.file().settings[k], DATA_KEY)).replace(`"atomicWeight":${NI}`, '"atomicWeight":58.7');
      await page.evaluate(([k, v]) => window.__stubWorkbook.setSetting(k, v), [DATA_KEY, damaged]);
      await reopen(page);
      const r = await plateNi(page);
      assert.equal(r.error, '#N/A');
      assert.match(r.message, /pinned data set could not be read: the checksum of the pinned part "Atomic weights" does not match/);
      await page.click('#tab-data');
      assert.match(await text(page, '#data-unreadable-reason'), /checksum of the pinned part "Atomic weights" does not match its content/);
      assert.equal(await page.evaluate((k) => window.__stubWorkbook.file().settings[k], DATA_KEY), damaged);
      await fitsWidth(page);
      await shot(page, '32-data-set-unreadable', '#tab-data');
      await page.click('#data-remove');
      await confirmDialog(page, true);
      await waitIdle(page);
      assert.equal(await page.evaluate((k) => window.__stubWorkbook.file().settings[k] ?? null, DATA_KEY), null);
      assert.ok(Math.abs((await plateNi(page)) - plateMinutes(NI)) < 1e-9);
    },
  },
];
