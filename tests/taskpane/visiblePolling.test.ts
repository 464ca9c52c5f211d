/**
 * The pane's look for changes made elsewhere runs every 20 s only while the pane is visible: hidden, no
 * timer runs; visible again, it looks once at once and resumes; focus makes it look too.
 */
import { afterEach, describe, expect, it, vi } from 'vitest';
import { pollWhileVisible } from '../../taskpane/visiblePolling';

class FakeDocument extends EventTarget {
  visibilityState: 'visible' | 'hidden' = 'visible';
  show(state: 'visible' | 'hidden'): void {
    this.visibilityState = state;
    this.dispatchEvent(new Event('visibilitychange'));
  }
}

afterEach(() => vi.useRealTimers());

describe('pollWhileVisible', () => {
  it('checks every period while visible, not at all while hidden, and once at once when shown again', () => {
    vi.useFakeTimers();
    const doc = new FakeDocument();
    const win = new EventTarget();
    const check = vi.fn();
    const stop = pollWhileVisible(check, 20_000, doc, win);
    vi.advanceTimersByTime(60_000);
    expect(check).toHaveBeenCalledTimes(3);
    doc.show('hidden');
    vi.advanceTimersByTime(10 * 60_000);
    expect(check).toHaveBeenCalledTimes(3); // nothing while hidden
    expect(vi.getTimerCount()).toBe(0);
    doc.show('visible');
    expect(check).toHaveBeenCalledTimes(4); // at once
    vi.advanceTimersByTime(20_000);
    expect(check).toHaveBeenCalledTimes(5);
    doc.show('visible'); // a repeated event does not start a second timer
    expect(vi.getTimerCount()).toBe(1);
    win.dispatchEvent(new Event('focus'));
    expect(check).toHaveBeenCalledTimes(6);
    stop();
    vi.advanceTimersByTime(60_000);
    win.dispatchEvent(new Event('focus'));
    doc.show('hidden');
    doc.show('visible');
    expect(check).toHaveBeenCalledTimes(6);
    expect(vi.getTimerCount()).toBe(0);
  });

  it('a pane that starts hidden starts no timer until it is shown', () => {
    vi.useFakeTimers();
    const doc = new FakeDocument();
    doc.visibilityState = 'hidden';
    const check = vi.fn();
    pollWhileVisible(check, 20_000, doc, new EventTarget());
    vi.advanceTimersByTime(60_000);
    expect(check).not.toHaveBeenCalled();
    expect(vi.getTimerCount()).toBe(0);
    doc.show('visible');
    expect(check).toHaveBeenCalledTimes(1);
    expect(vi.getTimerCount()).toBe(1);
  });
});
