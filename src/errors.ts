/**
 * Errors raised by the core. The core knows nothing of Excel: the worksheet adapter
 * (functions/adapter.ts) maps each kind to an Excel error.
 *
 * - NotFoundError  → #N/A with its message (unknown couple, electrode, species, model, element,
 *                    or a table that cannot be used)
 * - InputError     → #VALUE! with its message (text that cannot be read as what was expected, or a
 *                    number the user must change: outside a model's or the data's stated range)
 * - DomainError    → #NUM!, which Excel shows without a message: only for a result that cannot be
 *                    represented (outside double range)
 */
export class CellwrightError extends Error {
  constructor(message: string) {
    // These errors carry a reason for a cell, not a place in the code: where the engine records stacks
    // (Error.stackTraceLimit), none is recorded, so refusing a text (an unknown key among a million
    // cells) costs little.
    const E = Error as { stackTraceLimit?: number };
    const limit = E.stackTraceLimit;
    if (typeof limit === 'number') E.stackTraceLimit = 0;
    super(message);
    if (typeof limit === 'number') E.stackTraceLimit = limit;
    this.name = new.target.name;
  }
}

/** Something named does not exist (→ #N/A with message). */
export class NotFoundError extends CellwrightError {}

/** Text or a value that cannot be read as the expected type (→ #VALUE! with message). */
export class InputError extends CellwrightError {}

/** A result that cannot be represented, such as one outside double range (→ #NUM!, no message). */
export class DomainError extends CellwrightError {}

/** Throws DomainError unless x is a finite number; returns x. */
export function finite(x: number, what = 'result'): number {
  if (!Number.isFinite(x)) throw new DomainError(`${what} is outside the range of double-precision numbers`);
  return x;
}
