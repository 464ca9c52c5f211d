/**
 * First module of the functions bundle (webpack puts functions/declarations/*.ts after it).
 * Evaluated with only a CustomFunctions global (tests, demo, benchmark) the functions answer
 * from the built-in table; in Excel's shared runtime, runtime.ts starts reading the workbook's
 * own table before any table look-up answers.
 */
import './runtime';
