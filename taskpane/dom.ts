/**
 * The pane's only way of making elements: createElement, setAttribute and text nodes. Text is always
 * text: nothing here parses HTML, so a key, half-reaction, source or note holding markup is shown as
 * the characters it is (no innerHTML, outerHTML, insertAdjacentHTML or document.write anywhere).
 */
export type Child = Node | string | number | null | undefined | false;

export interface Props {
  readonly [name: string]: string | number | boolean | undefined | ((e: Event) => void);
}

/**
 * An element with attributes, listeners (props named on<Event>, e.g. onclick) and children.
 * Attribute values may be data (they are never parsed as markup); attribute names are fixed in code.
 * Inline style and inline event-handler attributes are refused (the page's CSP forbids them anyway).
 */
export function h<K extends keyof HTMLElementTagNameMap>(tag: K, props: Props = {}, ...children: Child[]): HTMLElementTagNameMap[K] {
  const el = document.createElement(tag);
  for (const [name, value] of Object.entries(props)) {
    if (value === undefined || value === false) continue;
    if (typeof value === 'function') {
      if (!/^on[a-z]+$/.test(name)) throw new Error(`listener prop ${name} must be on<event>`);
      el.addEventListener(name.slice(2), value);
      continue;
    }
    if (/^on/i.test(name) || name.toLowerCase() === 'style' || name.toLowerCase() === 'srcdoc') throw new Error(`attribute ${name} is not allowed`);
    if (name === 'class') el.className = String(value);
    else el.setAttribute(name, value === true ? '' : String(value));
  }
  append(el, ...children);
  return el;
}

/** Appends children (strings become text nodes). */
export function append(parent: Node, ...children: Child[]): void {
  for (const c of children) {
    if (c === null || c === undefined || c === false) continue;
    parent.appendChild(typeof c === 'string' || typeof c === 'number' ? document.createTextNode(String(c)) : c);
  }
}

/** Removes every child. */
export function clear(el: Element): void {
  while (el.firstChild) el.removeChild(el.firstChild);
}

/** Replaces an element's children. */
export function replace(el: Element, ...children: Child[]): void {
  clear(el);
  append(el, ...children);
}

/** The element with this id (throws when the page lacks it: a build mistake, not a user's). */
export function byId<T extends HTMLElement = HTMLElement>(id: string): T {
  const el = document.getElementById(id);
  if (el === null) throw new Error(`the page has no element #${id}`);
  return el as T;
}
