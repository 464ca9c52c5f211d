/*
 * A stand-in for office.js in the browser tests (served at /office-js/office.js by
 * scripts/test-browser.mjs; never shipped). It fakes just what Cellwright uses of Office and Excel:
 *
 *   Office.onReady, Office.HostType, Office.context.requirements.isSetSupported
 *   Excel.run with a request context whose
 *     workbook.settings       getItemOrNullObject(key) (load "value", isNullObject, delete), add(key, value),
 *                             onSettingsChanged.add(handler)
 *     workbook.application    calculate(type)
 *     workbook.worksheets     load("items/name"), items, add(name) → sheet.getRange(address) with
 *                             numberFormat / values / formulas / format.font.bold / format.columnWidth /
 *                             format.wrapText, sheet.pageLayout (orientation, zoom, setPrintTitleRows),
 *                             sheet.activate()
 *   and context.sync(). Queued writes take effect at sync; loaded values can be read only after sync.
 *   CustomFunctions.associate / Error / ErrorCode, so functions.js registers its functions here.
 *
 * The "workbook file" lives in localStorage, so reloading the page is closing and reopening the
 * workbook. window.__stubWorkbook lets the tests look inside: settings, recalculations, sheets, and
 * calling a registered worksheet function the way Excel does.
 */
(function () {
  'use strict';
  var FILE_KEY = 'cellwright-test-workbook';

  function loadFile() {
    try {
      var f = JSON.parse(localStorage.getItem(FILE_KEY) || 'null');
      if (f && typeof f === 'object') return f;
    } catch {
      /* a fresh file */
    }
    return { settings: {}, calculations: [], sheets: {}, runs: 0 };
  }
  var file = loadFile();
  function saveFile() {
    localStorage.setItem(FILE_KEY, JSON.stringify(file));
  }
  var settingsHandlers = [];

  function notLoaded(name) {
    var e = new Error('The property \'' + name + '\' is not available. Load it and call context.sync() first.');
    e.code = 'PropertyNotLoaded';
    return e;
  }

  function RequestContext() {
    var queue = [];
    var afterSync = [];
    var ctx = this;

    function settingItem(key) {
      var loaded = false;
      var item = {
        load: function () {
          afterSync.push(function () {
            loaded = true;
            item._present = Object.prototype.hasOwnProperty.call(file.settings, key);
            item._value = item._present ? JSON.parse(JSON.stringify(file.settings[key])) : null;
          });
          return item;
        },
        delete: function () {
          queue.push(function () {
            delete file.settings[key];
          });
        },
      };
      Object.defineProperty(item, 'value', {
        get: function () {
          if (!loaded) throw notLoaded('value');
          return item._value;
        },
      });
      Object.defineProperty(item, 'isNullObject', {
        get: function () {
          if (!loaded) throw notLoaded('isNullObject');
          return !item._present;
        },
      });
      return item;
    }

    function sheetObject(name) {
      return {
        name: name,
        getRange: function (address) {
          var range = { address: address, format: { font: {} } };
          queue.push(function () {
            var sheet = file.sheets[name];
            var write = { address: address };
            if (range.numberFormat) write.numberFormat = range.numberFormat;
            if (range.values) {
              // Excel turns text starting with "=" into a formula unless the cell is formatted as text.
              write.values = range.values;
              write.formulas = 0;
              range.values.forEach(function (row, i) {
                row.forEach(function (v, j) {
                  var fmt = range.numberFormat && range.numberFormat[i] && range.numberFormat[i][j];
                  if (typeof v === 'string' && v.charAt(0) === '=' && fmt !== '@') write.formulas++;
                });
              });
            }
            if (range.formulas) {
              // Range.formulas: a text starting with "=" is a formula, anything else a constant
              write.values = range.formulas;
              write.formulas = 0;
              range.formulas.forEach(function (row) {
                row.forEach(function (v) {
                  if (typeof v === 'string' && v.charAt(0) === '=') write.formulas++;
                });
              });
            }
            if (range.format.font.bold === true) write.bold = true;
            if (typeof range.format.columnWidth === 'number') write.columnWidth = range.format.columnWidth;
            if (range.format.wrapText === true) write.wrapText = true;
            sheet.writes.push(write);
          });
          return range;
        },
        pageLayout: (function () {
          var layout = {
            setPrintTitleRows: function (rows) {
              queue.push(function () {
                file.sheets[name].printTitleRows = rows;
              });
            },
          };
          ['orientation', 'zoom'].forEach(function (prop) {
            Object.defineProperty(layout, prop, {
              set: function (v) {
                queue.push(function () {
                  file.sheets[name][prop] = JSON.parse(JSON.stringify(v));
                });
              },
            });
          });
          return layout;
        })(),
        charts: {
          // charts.add(type, sourceRange, seriesBy) → a chart whose title.text is recorded at sync
          add: function (type, source, seriesBy) {
            var chart = { title: {} };
            queue.push(function () {
              var sheet = file.sheets[name];
              sheet.charts = sheet.charts || [];
              sheet.charts.push({ type: type, source: source.address, seriesBy: seriesBy, title: chart.title.text });
            });
            return chart;
          },
        },
        activate: function () {
          queue.push(function () {
            Object.keys(file.sheets).forEach(function (n) {
              file.sheets[n].active = n === name;
            });
          });
        },
      };
    }

    var worksheets = {
      items: [],
      load: function () {
        afterSync.push(function () {
          worksheets.items = Object.keys(file.sheets).map(function (n) {
            return { name: n };
          });
        });
        return worksheets;
      },
      add: function (name) {
        queue.push(function () {
          if (file.sheets[name]) throw new Error('A sheet named ' + name + ' already exists.');
          file.sheets[name] = { writes: [], active: false };
        });
        return sheetObject(name);
      },
    };

    this.workbook = {
      settings: {
        getItemOrNullObject: settingItem,
        add: function (key, value) {
          queue.push(function () {
            file.settings[key] = JSON.parse(JSON.stringify(value));
          });
        },
        onSettingsChanged: {
          add: function (handler) {
            settingsHandlers.push(handler);
          },
        },
      },
      application: {
        calculate: function (type) {
          queue.push(function () {
            file.calculations.push(type);
          });
        },
      },
      worksheets: worksheets,
    };
    this.sync = function () {
      return new Promise(function (resolve, reject) {
        setTimeout(function () {
          try {
            var ops = queue.splice(0);
            ops.forEach(function (op) {
              op();
            });
            afterSync.splice(0).forEach(function (f) {
              f();
            });
            saveFile();
            resolve();
          } catch (e) {
            reject(e);
          }
        }, 1);
      });
    };
    void ctx;
  }

  var registered = {};

  function CfError(code, message) {
    this.code = code;
    this.message = message;
  }

  window.CustomFunctions = {
    Error: CfError,
    ErrorCode: {
      invalidValue: '#VALUE!',
      notAvailable: '#N/A',
      divisionByZero: '#DIV/0!',
      invalidNumber: '#NUM!',
      nullReference: '#NULL!',
      invalidName: '#NAME?',
      invalidReference: '#REF!',
    },
    associate: function (id, fn) {
      if (typeof id === 'string') registered[id.toUpperCase()] = fn;
      else
        Object.keys(id).forEach(function (k) {
          registered[k.toUpperCase()] = id[k];
        });
    },
  };

  window.Excel = {
    CalculationType: { recalculate: 'Recalculate', full: 'Full', fullRebuild: 'FullRebuild' },
    ChartType: { xyscatterLines: 'XYScatterLines' },
    ChartSeriesBy: { auto: 'Auto', columns: 'Columns', rows: 'Rows' },
    run: function (callback) {
      file.runs = (file.runs || 0) + 1;
      return Promise.resolve().then(function () {
        return callback(new RequestContext());
      });
    },
  };

  var ready = new Promise(function (resolve) {
    setTimeout(function () {
      resolve({ host: 'Excel', platform: 'OfficeOnline' });
    }, 5);
  });
  window.Office = {
    HostType: { Excel: 'Excel' },
    context: {
      requirements: {
        isSetSupported: function () {
          return true;
        },
      },
    },
    onReady: function (callback) {
      return ready.then(function (info) {
        if (typeof callback === 'function') callback(info);
        return info;
      });
    },
  };

  window.__stubWorkbook = {
    file: function () {
      return JSON.parse(JSON.stringify(file));
    },
    setSetting: function (key, value) {
      file.settings[key] = value;
      saveFile();
    },
    removeSetting: function (key) {
      delete file.settings[key];
      saveFile();
    },
    /** Another pane or co-author writes the setting: stored, and the change event fires. */
    writeElsewhere: function (key, value) {
      file.settings[key] = value;
      saveFile();
      settingsHandlers.forEach(function (h) {
        h({ type: 'SettingsChanged' });
      });
    },
    functionIds: function () {
      return Object.keys(registered);
    },
    /** Calls a registered worksheet function like Excel: every argument as given, an invocation last. */
    call: function (id) {
      var args = Array.prototype.slice.call(arguments, 1);
      args.push({ functionName: id, address: 'Sheet1!A1' });
      return Promise.resolve(registered[id].apply(null, args)).then(function (r) {
        var v = r[0][0];
        return v instanceof CfError ? { error: v.code, message: v.message } : v;
      });
    },
  };
})();
