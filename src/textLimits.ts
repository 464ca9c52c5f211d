/**
 * Length limits on every text Cellwright reads, checked before any pattern runs on the text. The same
 * limits hold in the worksheet functions, the stored-table reader, CSV import and the task pane's
 * fields, so a text one path accepts is accepted by every other, and no text is long enough to make a
 * reader's work noticeable (every pattern is also linear in the length of its text).
 *
 * The limits are far above anything real: the longest built-in couple key has 21 characters, the
 * longest half-reaction 41, the longest source 261 and the longest note 334.
 */

/** A couple key, an electrode name or one of its other names. */
export const MAX_KEY_CHARS = 100;
/** A half-reaction, a chemical formula or a species. */
export const MAX_FORMULA_CHARS = 1000;
/** A number written as text ("0.3419", "-1.5e-3"). */
export const MAX_NUMBER_CHARS = 400;
/** The source of a row. */
export const MAX_SOURCE_CHARS = 1000;
/** The note of a row. */
export const MAX_NOTE_CHARS = 2000;
/** A version of the built-in table ("2026.1"). */
export const MAX_VERSION_CHARS = 20;
/** The name a person gives for the revision log ("A. Tester"). */
export const MAX_PERSON_CHARS = 100;
/** The reason a person gives for a change, recorded in the revision log. */
export const MAX_REASON_CHARS = 500;
