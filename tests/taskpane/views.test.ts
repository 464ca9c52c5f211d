/**
 * The pane's modules load without starting the pane (main.ts starts it), so views and helpers can be
 * tested on their own. Here there is no DOM at all: any module that touched the page when imported
 * would throw.
 */
import { describe, expect, it } from 'vitest';

describe('task pane modules', () => {
  it('load without a page and without starting', async () => {
    expect(typeof document).toBe('undefined');
    const pane = await import('../../taskpane/taskpane');
    expect(typeof pane.start).toBe('function');
    const state = await import('../../taskpane/state');
    expect(state.ui.ready).toBe(false);
  });

  it('write counts, signs and field names the way the pane shows them', async () => {
    const { fieldLabel, plural, signed } = await import('../../taskpane/format');
    expect(plural(1, 'row')).toBe('1 row');
    expect(plural(2000, 'row')).toBe('2,000 rows');
    expect(signed(-0.76)).toBe('\u22120.76');
    expect(signed(0.34)).toBe('+0.34');
    expect(fieldLabel('e0')).toBe('E°');
    expect(fieldLabel('source')).toBe('source');
  });
});
