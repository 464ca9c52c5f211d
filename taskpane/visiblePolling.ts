/**
 * Runs a check every `everyMs` while the page is visible, and not at all while it is hidden (the pane
 * closed or Excel minimised, document.visibilityState "hidden"). When the page becomes visible again the
 * check runs once at once and the timer starts afresh; it also runs when the window gets focus.
 *
 * Takes the document and window it watches so tests can hand in stand-ins. Returns a function that
 * stops everything.
 */
export interface VisibilitySource {
  readonly visibilityState: string;
  addEventListener(type: 'visibilitychange', listener: () => void): void;
  removeEventListener(type: 'visibilitychange', listener: () => void): void;
}
export interface FocusSource {
  addEventListener(type: 'focus', listener: () => void): void;
  removeEventListener(type: 'focus', listener: () => void): void;
}

export function pollWhileVisible(check: () => void, everyMs: number, doc: VisibilitySource = document, win: FocusSource = window): () => void {
  let timer: ReturnType<typeof setInterval> | null = null;
  const start = () => {
    if (timer === null) timer = setInterval(check, everyMs);
  };
  const stop = () => {
    if (timer !== null) clearInterval(timer);
    timer = null;
  };
  const onVisibility = () => {
    if (doc.visibilityState === 'hidden') {
      stop();
    } else if (timer === null) {
      check();
      start();
    }
  };
  const onFocus = () => check();
  doc.addEventListener('visibilitychange', onVisibility);
  win.addEventListener('focus', onFocus);
  if (doc.visibilityState !== 'hidden') start();
  return () => {
    stop();
    doc.removeEventListener('visibilitychange', onVisibility);
    win.removeEventListener('focus', onFocus);
  };
}
