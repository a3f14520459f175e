import { input, SOURCES } from './explanation';
import { FORMULAS } from './formulas';
import { totalFigure } from './totalFigure';

/** Catalogue entries of the design's refresh burden, in the order of the JSON summary. */
export const TOTAL_REFRESH_FIGURES = [
  totalFigure({
    key: 'refreshRows',
    label: 'Rows to refresh',
    quantity: 'count',
    group: null,
    exportKey: 'refreshRows',
    value: (r) => r.totals.refresh.rows,
  }),
  totalFigure({
    key: 'refreshInterval',
    label: 'Refresh interval',
    quantity: 'time',
    group: 'Refresh',
    exportKey: 'refreshInterval_s',
    cli: { label: 'refresh interval tREFI' },
    value: (r) => r.totals.refresh.interval,
    explain: (_r, design) => ({
      symbol: 'tREFI',
      formula: 'tREFI = tREFW / commands per window',
      inputs: [
        input('tREFW', 'refresh window', design.operating.refreshWindow, 'time'),
        input('n_cmd', 'commands per window', design.operating.refreshCommandsPerWindow, 'count'),
      ],
      method: 'Refresh commands spread evenly over the window.',
      source: SOURCES.jedec,
    }),
  }),
  totalFigure({
    key: 'rowsPerCommand',
    label: 'Rows per refresh command',
    quantity: 'count',
    group: 'Refresh',
    exportKey: 'refreshRowsPerCommand',
    cli: { label: 'rows per refresh command' },
    value: (r) => r.totals.refresh.rowsPerCommand,
    explain: (r, design) => ({
      symbol: 'rows/cmd',
      formula: 'rows/cmd = ⌈rows / commands per window⌉',
      inputs: [
        input('rows', 'rows (mats in a band share a row)', r.totals.refresh.rows, 'count'),
        input('n_cmd', 'commands per window', design.operating.refreshCommandsPerWindow, 'count'),
      ],
      method: 'Every row once per window.',
      source: SOURCES.jedec,
    }),
  }),
  totalFigure({
    key: 'refreshCycleTime',
    label: 'Refresh cycle time',
    quantity: 'time',
    group: 'Refresh',
    exportKey: 'refreshCycleTime_s',
    cli: { label: 'refresh cycle time tRFC' },
    value: (r) => r.totals.refresh.cycleTime,
    explain: (r, design) => ({
      symbol: 'tRFC',
      formula: 'tRFC = ⌈rows/cmd / rows in parallel⌉ · tRC',
      inputs: [
        input('rows/cmd', 'rows per command', r.totals.refresh.rowsPerCommand, 'count'),
        input('n_par', 'rows refreshed in parallel', design.operating.refreshRowsInParallel, 'count'),
        input(
          'tRC',
          r.totals.refresh.rowCycleTimeOverridden
            ? 'row cycle time (process override)'
            : 'row cycle time (computed: the slowest mat’s tRAS + tRP)',
          r.totals.refresh.rowCycleTime,
          'time',
        ),
      ],
      method: 'Rows of one command go in parallel groups, one row cycle each.',
      source: SOURCES.common,
    }),
  }),
  totalFigure({
    key: 'refreshBusyFraction',
    label: 'Refresh busy fraction',
    quantity: 'percent',
    group: 'Refresh',
    exportKey: 'refreshBusyFraction_ratio',
    cli: { label: 'refresh busy fraction' },
    value: (r) => r.totals.refresh.busyFraction,
    explain: (r) => ({
      symbol: 'tRFC/tREFI',
      formula: FORMULAS.refreshBusyFraction,
      inputs: [
        input('tRFC', 'refresh cycle time', r.totals.refresh.cycleTime, 'time'),
        input('tREFI', 'refresh interval', r.totals.refresh.interval, 'time'),
      ],
      method: 'Share of time the array cannot serve accesses.',
      source: SOURCES.jedec,
    }),
  }),
  totalFigure({
    key: 'refreshPower',
    label: 'Refresh power',
    quantity: 'power',
    group: 'Refresh',
    exportKey: 'refreshPower_W',
    cli: { label: 'refresh power' },
    value: (r) => r.totals.refresh.power,
    explain: (_r, design) => ({
      symbol: 'P_ref',
      formula: FORMULAS.refreshPower,
      inputs: [input('tREFW', 'refresh window', design.operating.refreshWindow, 'time')],
      method: 'Every word line of every mat activated once per window.',
      source: SOURCES.common,
    }),
  }),
] as const;
