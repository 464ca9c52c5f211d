/**
 * Worksheet declarations: provenance of the results (which potential table and which add-in
 * version). JSDoc for custom-functions-metadata-plugin; the body is one call into
 * functions/families/provenance.ts.
 */
/* eslint-disable @typescript-eslint/no-explicit-any */
import * as F from '../families/provenance';

/**
 * A fact about the potential table in use, for a template's header: "origin" (built-in, workbook, pinned built-in, unreadable), "version", "checksum" (SHA-256), "revision", "changed" (an Excel date serial), "couples", "electrodes", or "addin" (the add-in's version). Recalculates when the table changes.
 * @customfunction TABLEINFO
 * @helpurl https://localhost:3000/docs/functions.html#tableinfo
 * @param field One of "origin", "version", "checksum", "revision", "changed", "couples", "electrodes", "addin".
 * @returns The fact (text or number).
 */
function tableInfo(field: any[][]): any[][] {
  return F.TABLEINFO(field) as any;
}
