/**
 * An Excel workbook for tests, built on office-addin-mock: `Excel.run` hands out a request context
 * (an OfficeMockObject) whose settings, application and worksheets act on one shared WorkbookFile, so
 * two "panes" (two models, or a pane and the functions runtime) can work on the same workbook.
 *
 * Like Excel, writes and recalculations queued in a batch take effect at context.sync(), and values
 * must be loaded and synced before they are read (office-addin-mock enforces load/sync).
 */
import { OfficeMockObject } from 'office-addin-mock';

/** office-addin-mock objects take any property path; the tests read and set them freely. */
// eslint-disable-next-line @typescript-eslint/no-explicit-any
type MockRecord = Record<string, any>;

export interface SheetWrite {
  readonly address: string;
  values?: unknown[][];
  numberFormat?: unknown[][];
  bold?: boolean;
  columnWidth?: number;
  wrapText?: boolean;
}

export class WorkbookFile {
  readonly settings = new Map<string, unknown>();
  /** Every application.calculate(type) that reached the workbook, in order. */
  readonly calculations: string[] = [];
  readonly sheets = new Map<string, { writes: SheetWrite[]; activated: boolean }>();
  readonly settingsChangedHandlers: Array<(args: unknown) => unknown> = [];
  /** Runs once, inside the next sync that writes a setting, before the write (another pane acting in between). */
  beforeNextWrite: (() => Promise<void>) | null = null;
  /** When set, Excel.run waits for it before running (to hold start-up reads). */
  gate: Promise<void> | null = null;
  /** Count of Excel.run calls. */
  runs = 0;

  constructor(init: Record<string, unknown> = {}) {
    for (const [k, v] of Object.entries(init)) this.settings.set(k, v);
  }
}

type Op = { write: boolean; apply: () => void };

function makeContext(file: WorkbookFile): unknown {
  const queue: Op[] = [];
  const created: OfficeMockObject[] = [];
  const ranges: Array<{ sheet: string; mock: MockRecord; address: string }> = [];

  const settingItem = (key: string) => {
    const present = file.settings.has(key);
    const item = new OfficeMockObject({
      key,
      value: present ? structuredClone(file.settings.get(key)) : undefined,
      delete: function () {
        queue.push({ write: true, apply: () => void file.settings.delete(key) });
      },
    }) as unknown as Record<string, unknown>;
    item.isNullObject = !present;
    created.push(item as unknown as OfficeMockObject);
    return item;
  };

  const sheetObject = (name: string) => ({
    name,
    getRange(address: string) {
      const mock = new OfficeMockObject({ format: { font: { bold: false }, columnWidth: 0, wrapText: false } }) as unknown as MockRecord;
      ranges.push({ sheet: name, mock, address });
      return mock;
    },
    activate() {
      queue.push({ write: true, apply: () => void (file.sheets.get(name)!.activated = true) });
    },
  });

  const worksheets = {
    items: [] as Array<{ name: string }>,
    load(_what: string) {
      queue.push({ write: false, apply: () => void (worksheets.items = [...file.sheets.keys()].map((n) => ({ name: n }))) });
      return worksheets;
    },
    add(name: string) {
      queue.push({ write: true, apply: () => void file.sheets.set(name, { writes: [], activated: false }) });
      return sheetObject(name);
    },
  };

  const context = new OfficeMockObject({
    workbook: {
      settings: {
        getItemOrNullObject: function (key: string) {
          return settingItem(key);
        },
        add: function (key: string, value: unknown) {
          queue.push({
            write: true,
            apply: () => {
              file.settings.set(key, structuredClone(value));
              for (const h of file.settingsChangedHandlers) void h({ type: 'SettingsChanged' });
            },
          });
        },
        onSettingsChanged: {
          add: function (handler: (args: unknown) => unknown) {
            file.settingsChangedHandlers.push(handler);
          },
        },
      },
      application: {
        calculate: function (type: string) {
          queue.push({ write: false, apply: () => void file.calculations.push(type) });
        },
      },
    },
    sync: async function () {
      const ops = queue.splice(0);
      if (ops.some((o) => o.write) && file.beforeNextWrite !== null) {
        const hook = file.beforeNextWrite;
        file.beforeNextWrite = null;
        await hook();
      }
      for (const o of ops) o.apply();
      for (const r of ranges.splice(0)) {
        const sheet = file.sheets.get(r.sheet);
        if (sheet === undefined) throw new Error(`no sheet ${r.sheet}`);
        const m = r.mock;
        const w: SheetWrite = { address: r.address };
        if (Array.isArray(m.values)) w.values = m.values;
        if (Array.isArray(m.numberFormat)) w.numberFormat = m.numberFormat;
        if (m.format.font.bold === true) w.bold = true;
        if (typeof m.format.columnWidth === 'number' && m.format.columnWidth > 0) w.columnWidth = m.format.columnWidth;
        if (m.format.wrapText === true) w.wrapText = true;
        sheet.writes.push(w);
      }
      for (const c of created.splice(0)) await c.sync();
    },
  }) as unknown as MockRecord;
  // Collections that office-addin-mock cannot model (arrays of items) are plain objects.
  context.workbook.worksheets = worksheets;
  return context;
}

/** An `Excel` global for the given workbook. */
export function excelFor(file: WorkbookFile): unknown {
  const excel = new OfficeMockObject({
    run: async function (callback: (context: unknown) => Promise<unknown>) {
      file.runs++;
      if (file.gate !== null) await file.gate;
      return callback(makeContext(file));
    },
  }) as unknown as Record<string, unknown>;
  excel.CalculationType = { recalculate: 'Recalculate', full: 'Full', fullRebuild: 'FullRebuild' };
  return excel;
}

/** An `Office` global as Excel's shared runtime presents it (host Excel, every requirement set supported). */
export function officeFor(host: 'Excel' | null = 'Excel', supported = true): unknown {
  const office = new OfficeMockObject({
    onReady: function () {
      return Promise.resolve({ host, platform: host === null ? null : 'OfficeOnline' });
    },
  }) as unknown as Record<string, unknown>;
  office.HostType = { Excel: 'Excel' };
  office.context = { requirements: { isSetSupported: () => supported } };
  return office;
}

/** The CustomFunctions global the adapter needs for error values. */
export class FakeCfError {
  constructor(
    public readonly code: string,
    public readonly message?: string,
  ) {}
}
export const customFunctionsGlobal = {
  Error: FakeCfError,
  ErrorCode: { invalidValue: '#VALUE!', notAvailable: '#N/A', invalidNumber: '#NUM!', divisionByZero: '#DIV/0!', nullReference: '#NULL!', invalidName: '#NAME?', invalidReference: '#REF!' },
  associate() {},
};
