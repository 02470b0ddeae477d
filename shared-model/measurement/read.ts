/**
 * Reading a bench measurement from CSV text or cells pasted from a spreadsheet (csv/read.ts finds the
 * separator): the first row names the columns (columns.ts), each further row is one measured point.
 * Every problem is reported at once with its line, column, the value found and what was expected; when
 * there is any problem nothing is imported. Checks: unknown, repeated and missing columns; exactly one
 * input-side column (efficiency, efficiencyPct, inputPowerW or inputCurrentA); cells that are not plain
 * numbers; each value within its field's range (design/numbers.ts); temperatures only for roles the design
 * has; an input power not above the output power (efficiency of 1 or more); the same point (Vin, load,
 * ambient, fs) measured twice.
 */
import { readCsv } from '../csv/read.ts';
import type { Design, Role } from '../design/schema.ts';
import { inRange, numberRangeOf, rangeText } from '../design/number-range.ts';
import { columnOf, COLUMNS, INPUT_COLUMNS, REQUIRED_COLUMNS, type ColumnSpec } from './columns.ts';
import type { MeasuredPoint, Measurement } from './schema.ts';

export interface MeasurementProblem {
  /** 1-based line of the text (1: the header row). */
  line: number;
  /** The column's header as written, or '' for the whole table. */
  column: string;
  /** The cell as written ('' when missing). */
  value: string;
  /** What was expected there. */
  expected: string;
  /** One sentence naming the line, the column, the value and what was expected. */
  message: string;
}

export type MeasurementRead =
  | { ok: true; measurement: Measurement }
  | { ok: false; problems: MeasurementProblem[] };

export interface ReadMeasurementOptions {
  /** What was measured (the measurement's name). */
  name?: string;
  /** When given: temperature columns must name the design's roles, and the power balance is checked with its Vout. */
  design?: Design;
}

const MAX_ROWS = 10_000;
const NUMBER = /^[+-]?(\d+\.?\d*|\.\d+)([eE][+-]?\d+)?$/;

const rolesOf = (design: Design): Set<Role> => {
  const roles = new Set<Role>(['switch', 'rectifier', 'inductor', 'inputCapacitor', 'outputCapacitor', 'controller']);
  if (design.parts.senseResistor) roles.add('senseResistor');
  return roles;
};

/** Reads `text` (see the header). */
export function readMeasurement(text: string, options: ReadMeasurementOptions = {}): MeasurementRead {
  const table = readCsv(text);
  const problems: MeasurementProblem[] = table.problems.map((p) => ({ line: p.line, column: '', value: '', expected: 'a closed quoted field', message: p.message }));
  const say = (line: number, column: string, value: string, expected: string, message: string) =>
    problems.push({ line, column, value, expected, message });
  const [header, ...rows] = table.rows;
  if (!header) {
    say(1, '', '', 'a header row and at least one measured point', 'The measurement is empty: give a header row (vinV, loadA, efficiency, …) and one row per measured point.');
    return { ok: false, problems };
  }
  const specs: (ColumnSpec | undefined)[] = header.cells.map((cell) => columnOf(cell));
  const seen = new Map<string, number>();
  header.cells.forEach((cell, i) => {
    const spec = specs[i];
    if (!spec) {
      say(header.line, cell, cell, `one of ${COLUMNS.map((c) => c.name).join(', ')}`,
        `Line ${header.line}: the column "${cell}" is not one WattLedger knows; rename it to one of ${COLUMNS.map((c) => c.name).join(', ')} or delete it (header names match without regard to case).`);
      return;
    }
    if (seen.has(spec.name)) {
      say(header.line, cell, cell, 'each column once', `Line ${header.line}: the column ${spec.name} appears twice (columns ${seen.get(spec.name)! + 1} and ${i + 1}).`);
    } else seen.set(spec.name, i);
    if ('role' in spec.target && options.design && !rolesOf(options.design).has(spec.target.role)) {
      say(header.line, cell, cell, 'a temperature of a part the design has',
        `Line ${header.line}: the column ${cell} is a temperature of the ${spec.target.role}, which this design does not have.`);
    }
  });
  for (const key of REQUIRED_COLUMNS) {
    if (!seen.has(key)) say(header.line, key, '', `a column named ${key}`, `Line ${header.line}: the column ${key} is missing; a measurement needs vinV and loadA.`);
  }
  const inputs = INPUT_COLUMNS.filter((k) => seen.has(k));
  if (inputs.length !== 1) {
    say(header.line, inputs.join(', '), '', `exactly one of ${INPUT_COLUMNS.join(', ')}`,
      inputs.length === 0
        ? `Line ${header.line}: no efficiency or input column; give exactly one of ${INPUT_COLUMNS.join(', ')}.`
        : `Line ${header.line}: give exactly one of ${INPUT_COLUMNS.join(', ')} (found ${inputs.join(' and ')}); delete the others so the loss has one source.`);
  }
  if (rows.length === 0) say(header.line, '', '', 'at least one measured point', 'The measurement has a header but no measured point.');
  if (rows.length > MAX_ROWS) say(rows[MAX_ROWS]!.line, '', '', `at most ${MAX_ROWS} points`, `The measurement has ${rows.length} points; at most ${MAX_ROWS} are read.`);
  if (problems.length > 0) return { ok: false, problems };

  const points: MeasuredPoint[] = [];
  const keys = new Map<string, number>();
  for (const row of rows) {
    if (row.cells.length > header.cells.length) {
      say(row.line, '', row.cells.slice(header.cells.length).join(','), `${header.cells.length} cells (one per column)`,
        `Line ${row.line}: ${row.cells.length} cells but only ${header.cells.length} columns; a separator too many, or a value without a column.`);
      continue;
    }
    const point: Record<string, unknown> = {};
    const temperatures: Partial<Record<Role, number>> = {};
    let rowOk = true;
    header.cells.forEach((name, i) => {
      const spec = specs[i]!;
      const raw = (row.cells[i] ?? '').trim();
      const required = 'field' in spec.target && (REQUIRED_COLUMNS.includes(spec.target.field) || INPUT_COLUMNS.includes(spec.target.field));
      if (raw === '') {
        if (required) {
          rowOk = false;
          say(row.line, name, '', `a number (${spec.meaning})`, `Line ${row.line}, column ${name}: the cell is empty; every point needs its ${spec.meaning}.`);
        }
        return;
      }
      let text = raw;
      let factor = spec.name === 'efficiencyPct' ? 0.01 : 1;
      if (spec.name === 'efficiency' && /%\s*$/.test(text)) {
        text = text.replace(/\s*%\s*$/, '');
        factor = 0.01;
      }
      if (!NUMBER.test(text)) {
        rowOk = false;
        say(row.line, name, raw, `a plain number in ${spec.unit || 'the column\'s unit'}`,
          `Line ${row.line}, column ${name}: "${raw}" is not a number (write plain numbers such as 12.5 or 1.2e-3, in ${spec.unit === '' ? 'fractions' : spec.unit}, with a point as the decimal mark).`);
        return;
      }
      const value = Number(text) * factor;
      const range = numberRangeOf(spec.schema as never)!;
      if (!inRange(value, range)) {
        rowOk = false;
        const shown = factor === 0.01 ? `${Number(text)} %` : raw;
        const allowed = spec.name === 'efficiencyPct' || factor === 0.01 ? `0 % < ${name} < 100 %` : rangeText(range, name, spec.unit);
        const hint = spec.name === 'efficiency' && value >= 1 && value < 100 ? ' (a percentage needs a % sign, or use the column efficiencyPct)' : '';
        say(row.line, name, raw, allowed, `Line ${row.line}, column ${name}: ${shown} is outside ${allowed}${hint}.`);
        return;
      }
      if ('role' in spec.target) temperatures[spec.target.role] = value;
      else if (spec.target.field === 'efficiencyPct') point.efficiency = value;
      else point[spec.target.field] = value;
    });
    if (!rowOk) continue;
    if (Object.keys(temperatures).length > 0) point.temperaturesC = temperatures;
    const p = point as unknown as MeasuredPoint;
    const pin = inputPowerOf(p);
    const vout = p.voutV ?? options.design?.spec.voutV;
    if (pin !== undefined && vout !== undefined && pin <= vout * p.loadA) {
      say(row.line, p.inputPowerW !== undefined ? 'inputPowerW' : 'inputCurrentA', String(p.inputPowerW ?? p.inputCurrentA),
        `input power above the output power ${vout * p.loadA} W`,
        `Line ${row.line}: the input power ${round(pin)} W is not above the output power ${round(vout * p.loadA)} W (${vout} V × ${p.loadA} A); check the columns and units.`);
      continue;
    }
    const key = `${p.vinV}|${p.loadA}|${p.ambientC ?? ''}|${p.fsHz ?? ''}`;
    const first = keys.get(key);
    if (first !== undefined) {
      say(row.line, 'loadA', String(p.loadA), 'each point once',
        `Line ${row.line}: the same point (vinV ${p.vinV} V, loadA ${p.loadA} A${p.ambientC !== undefined ? `, ambientC ${p.ambientC} °C` : ''}) was already given on line ${first}; average repeated readings into one row.`);
      continue;
    }
    keys.set(key, row.line);
    points.push(p);
  }
  if (problems.length > 0) return { ok: false, problems };
  return { ok: true, measurement: { name: options.name ?? '', points } };
}

const round = (v: number) => Number(v.toPrecision(6));

/** Input power of a point from inputPowerW or vinV · inputCurrentA; undefined when it gives efficiency. */
export function inputPowerOf(p: MeasuredPoint): number | undefined {
  if (p.inputPowerW !== undefined) return p.inputPowerW;
  if (p.inputCurrentA !== undefined) return p.vinV * p.inputCurrentA;
  return undefined;
}
