/**
 * The editable fields of each part kind (keys from shared-model/design/parts.ts). Used by the design
 * editor and by the part library editor. Labels use trade terms; units are SI symbols.
 */
import { CURVE_POINTS, type PartKind } from '../../shared-model/index.ts';
import { num, type FieldSpec, type UnionSpec } from './field-spec.ts';

const identity: FieldSpec[] = [
  { type: 'text', key: 'name', label: 'Name' },
  { type: 'text', key: 'id', label: 'Identifier' },
  { type: 'boolean', key: 'invented', label: 'Invented example (describes no real part)', optional: true },
];

const notes: FieldSpec = { type: 'text', key: 'notes', label: 'Notes', optional: true, multiline: true };

const rdsLaw: UnionSpec = {
  type: 'union',
  key: 'rdsTemperatureLaw',
  label: 'RDS(on) temperature law',
  tag: 'law',
  variants: [
    { value: 'linear', label: 'Linear coefficient', fields: [num('alphaPerK', 'Coefficient α', '/K')], defaults: () => ({ alphaPerK: 0.005 }) },
    { value: 'power', label: 'Power law in kelvin', fields: [num('exponent', 'Exponent k', '')], defaults: () => ({ exponent: 2 }) },
    {
      value: 'two-point',
      label: 'Two datasheet points',
      fields: [
        { type: 'choice', key: 'shape', label: 'Fitted as', options: [{ value: 'linear', label: 'linear' }, { value: 'power', label: 'power law' }] },
        num('hotC', 'Hot point temperature', '°C'),
        num('hotRatio', 'RDS(on) ratio at hot point', ''),
      ],
      defaults: () => ({ shape: 'linear', hotC: 125, hotRatio: 1.5 }),
    },
    {
      value: 'table',
      label: 'Normalised curve from the datasheet',
      fields: [
        {
          type: 'table',
          key: 'points',
          label: 'RDS(on)(Tj) / RDS(on)(25 °C)',
          columns: [
            { key: 'tjC', label: 'Tj', unit: '°C' },
            { key: 'ratio', label: 'Ratio', unit: '' },
          ],
          minRows: CURVE_POINTS.min,
          maxRows: CURVE_POINTS.max,
          help: 'Tj rising, ratio never falling. Between points RDS(on) follows straight lines; beyond the ends the end ratio is held (a notice says when the table stops below Tj max).',
        },
      ],
      // A starting curve of the usual shape (invented): edit or paste over it.
      defaults: () => ({
        points: [
          { tjC: -50, ratio: 0.75 },
          { tjC: 25, ratio: 1 },
          { tjC: 100, ratio: 1.45 },
          { tjC: 150, ratio: 1.8 },
        ],
      }),
    },
  ],
};

const outputCapacitance: UnionSpec = {
  type: 'union',
  key: 'outputCapacitance',
  label: 'Output capacitance',
  tag: 'kind',
  variants: [
    { value: 'capacitance', label: 'Coss at a voltage', fields: [num('cossF', 'Coss', 'F'), num('atV', 'Measured at', 'V')], defaults: () => ({ cossF: 300e-12, atV: 12 }) },
    {
      value: 'charge-energy',
      label: 'Qoss and Eoss at a voltage',
      fields: [num('qossC', 'Qoss', 'C'), num('eossJ', 'Eoss', 'J'), num('atV', 'Measured at', 'V')],
      defaults: () => ({ qossC: 5e-9, eossJ: 20e-9, atV: 12 }),
    },
    {
      value: 'table',
      label: 'Coss(VDS) curve from the datasheet',
      fields: [
        {
          type: 'table',
          key: 'points',
          label: 'Coss(VDS) points',
          columns: [
            { key: 'vdsV', label: 'VDS', unit: 'V' },
            { key: 'cossF', label: 'Coss', unit: 'F' },
          ],
          minRows: CURVE_POINTS.min,
          maxRows: CURVE_POINTS.max,
          logY: true,
          help: 'VDS rising, Coss never rising. Qoss and Eoss at the switched voltage are integrated from the curve; above the last point its Coss is held (a notice says so).',
        },
      ],
      // A starting curve shaped like a small low-voltage FET's (invented): edit or paste over it.
      defaults: () => ({
        points: [
          { vdsV: 0, cossF: 1.2e-9 },
          { vdsV: 5, cossF: 600e-12 },
          { vdsV: 15, cossF: 330e-12 },
          { vdsV: 30, cossF: 240e-12 },
        ],
      }),
    },
  ],
};

const mosfet: FieldSpec[] = [
  num('vdsRatingV', 'VDS rating', 'V'),
  num('idRatingA', 'ID rating', 'A'),
  num('rdsOn25Ohm', 'RDS(on) at 25 °C', 'Ω'),
  rdsLaw,
  num('qgC', 'Total gate charge Qg', 'C'),
  num('qgs2C', 'Qgs2 (after threshold)', 'C', { optional: true }),
  num('qgsC', 'Qgs (used when Qgs2 is blank)', 'C', { optional: true }),
  num('qgdC', 'Gate-drain charge Qgd', 'C'),
  num('vthV', 'Threshold voltage', 'V'),
  num('plateauV', 'Plateau voltage', 'V'),
  num('rgInternalOhm', 'Internal gate resistance', 'Ω'),
  outputCapacitance,
  num('bodyDiodeVsdV', 'Body diode VSD', 'V'),
  num('bodyDiodeQrrC', 'Body diode Qrr', 'C'),
  num('bodyDiodeQrrTestA', 'Qrr measured at forward current (blank: rated load)', 'A', { optional: true }),
  num('tjMaxC', 'Tj max', '°C'),
  num('thetaJcKPerW', 'θJC', 'K/W'),
];

const diode: FieldSpec[] = [
  { type: 'choice', key: 'technology', label: 'Technology', options: [{ value: 'schottky', label: 'Schottky' }, { value: 'pn', label: 'PN junction' }] },
  num('vf0V', 'Forward voltage VF0', 'V'),
  num('rdOhm', 'Slope resistance Rd', 'Ω'),
  num('vfTempCoVPerK', 'VF0 temperature coefficient', 'V/K'),
  {
    type: 'group',
    key: 'vfCurves',
    label: 'Forward curves VF(IF) from the datasheet',
    fields: [
      {
        type: 'table',
        key: 'points',
        label: 'VF(IF) at each Tj',
        columns: [
          { key: 'tjC', label: 'Tj', unit: '°C' },
          { key: 'ifA', label: 'IF', unit: 'A' },
          { key: 'vfV', label: 'VF', unit: 'V' },
        ],
        series: 'tjC',
        minRows: 4,
        maxRows: CURVE_POINTS.max,
        help: 'Rows grouped by Tj, coldest curve first; within a curve IF rising and VF never falling; two or more temperatures. When given, the forward-drop loss integrates VF·i over the rectifier current and VF0, Rd and their coefficient are not used for it.',
      },
    ],
    // Starting curves from the single-value model, at 25 °C and 125 °C (edit or paste the datasheet's over them).
    defaults: (part) => {
      const v0 = Number(part.vf0V) || 0.4;
      const rd = Number(part.rdOhm) || 0.02;
      const tc = Number(part.vfTempCoVPerK) || -0.0015;
      const top = Number(part.ifRatingA) || 5;
      return {
        points: [25, 125].flatMap((tjC) =>
          [0.1, 0.5, 1].map((f) => ({ tjC, ifA: f * top, vfV: Math.max(v0 + tc * (tjC - 25), 0.05) + rd * f * top })),
        ),
      };
    },
  },
  num('qrrC', 'Reverse-recovery charge Qrr', 'C'),
  num('qrrTestA', 'Qrr measured at forward current (blank: rated load)', 'A', { optional: true }),
  num('cjF', 'Junction capacitance Cj', 'F'),
  num('leakageA', 'Reverse leakage', 'A'),
  num('leakageAtC', 'Leakage measured at', '°C'),
  num('leakageDoublingK', 'Leakage doubles every', 'K'),
  num('vrRatingV', 'VR rating', 'V'),
  num('ifRatingA', 'IF rating', 'A'),
  num('tjMaxC', 'Tj max', '°C'),
  num('thetaJcKPerW', 'θJC', 'K/W'),
];

const coreLoss: UnionSpec = {
  type: 'union',
  key: 'coreLoss',
  label: 'Core loss data',
  tag: 'kind',
  variants: [
    {
      value: 'steinmetz',
      label: 'Steinmetz coefficients',
      fields: [num('k', 'k (W/m³, f in Hz, B in T)', ''), num('alpha', 'Frequency exponent α', ''), num('beta', 'Flux exponent β', '')],
      defaults: () => ({ k: 3, alpha: 1.4, beta: 2.5 }),
    },
    {
      value: 'point',
      label: 'One datasheet point',
      fields: [
        num('lossWPerM3', 'Loss density', 'W/m³'),
        num('atHz', 'At frequency', 'Hz'),
        num('atPeakT', 'At peak flux', 'T'),
        num('alpha', 'Frequency exponent α', ''),
        num('beta', 'Flux exponent β', ''),
      ],
      defaults: () => ({ lossWPerM3: 100e3, atHz: 100e3, atPeakT: 0.1, alpha: 1.4, beta: 2.5 }),
    },
  ],
};

const acWinding: UnionSpec = {
  type: 'union',
  key: 'acWinding',
  label: 'Winding AC resistance',
  tag: 'kind',
  variants: [
    { value: 'none', label: 'Ignore', fields: [], defaults: () => ({}) },
    { value: 'factor', label: 'Rac/Rdc factor', fields: [num('racOverRdc', 'Rac / Rdc at fs', '')], defaults: () => ({ racOverRdc: 1.5 }) },
    {
      value: 'dowell',
      label: 'Layered winding (Dowell)',
      fields: [num('layers', 'Layers', ''), num('conductorThicknessM', 'Conductor thickness', 'm'), num('porosity', 'Porosity factor', '')],
      defaults: () => ({ layers: 2, conductorThicknessM: 0.2e-3, porosity: 0.8 }),
    },
  ],
};

const inductor: FieldSpec[] = [
  num('inductanceH', 'Inductance', 'H'),
  {
    type: 'group',
    key: 'rolloff',
    label: 'Inductance falls with current',
    fields: [num('currentA', 'At current', 'A'), num('inductanceH', 'Inductance there', 'H')],
    defaults: (part) => ({ currentA: Number(part.isatA) || 1, inductanceH: 0.8 * (Number(part.inductanceH) || 1e-6) }),
  },
  {
    type: 'group',
    key: 'inductanceCurve',
    label: 'Inductance curve L(I) from the datasheet',
    fields: [
      {
        type: 'table',
        key: 'points',
        label: 'L against DC current',
        columns: [
          { key: 'currentA', label: 'Current', unit: 'A' },
          { key: 'inductanceH', label: 'Inductance', unit: 'H' },
        ],
        minRows: CURVE_POINTS.min,
        maxRows: CURVE_POINTS.max,
        help: 'Current rising, inductance never rising. When given, the ripple and the peak follow the curve (flux linkage ∫L di) instead of the inductance and roll-off above; the last inductance is held beyond the last point (the result warns).',
      },
    ],
    // A starting curve of the usual soft roll-off shape from the values above (invented): edit or paste over it.
    defaults: (part) => {
      const l = Number(part.inductanceH) || 10e-6;
      const isat = Number(part.isatA) || 5;
      return { points: [0, 0.5, 1, 1.5].map((f, k) => ({ currentA: f * isat, inductanceH: l * [1, 0.95, 0.8, 0.5][k]! })) };
    },
  },
  num('dcr20Ohm', 'DCR at 20 °C', 'Ω'),
  num('isatA', 'Saturation current Isat', 'A'),
  num('isatAtC', 'Isat stated at', '°C'),
  num('isatTempCoPerK', 'Isat change per kelvin', '/K'),
  num('irmsRatingA', 'RMS current rating', 'A'),
  num('turns', 'Turns', ''),
  num('aeM2', 'Core area Ae', 'm²'),
  num('veM3', 'Core volume Ve', 'm³'),
  coreLoss,
  {
    type: 'group',
    key: 'coreLossTemperatureCurve',
    label: 'Core loss against temperature from the datasheet',
    fields: [
      {
        type: 'table',
        key: 'points',
        label: 'Core loss factor against temperature',
        columns: [
          { key: 'tC', label: 'Temperature', unit: '°C' },
          { key: 'factor', label: 'Factor', unit: '' },
        ],
        minRows: CURVE_POINTS.min,
        maxRows: CURVE_POINTS.max,
        help: 'Temperature rising, factor above 0: the material\'s loss at each temperature over the loss the core-loss data above gives. The core loss is multiplied by the factor at the inductor temperature, inside the temperature solve; the end factors are held outside the table (the result warns).',
      },
    ],
    // A starting curve of the usual ferrite shape (invented): minimum near 90 °C; paste the material's over it.
    defaults: () => ({ points: [25, 60, 90, 120].map((tC, k) => ({ tC, factor: [1.8, 1.2, 1, 1.3][k]! })) }),
  },
  acWinding,
  num('tMaxC', 'Maximum temperature', '°C'),
];

const capacitor: FieldSpec[] = [
  {
    type: 'choice',
    key: 'dielectric',
    label: 'Dielectric',
    options: [
      { value: 'ceramic', label: 'ceramic' },
      { value: 'electrolytic', label: 'aluminium electrolytic' },
      { value: 'polymer', label: 'polymer' },
      { value: 'film', label: 'film' },
    ],
  },
  num('capacitanceF', 'Capacitance', 'F'),
  num('esrOhm', 'ESR at fs', 'Ω'),
  num('esrTempCoPerK', 'ESR change per kelvin', '/K'),
  {
    type: 'group',
    key: 'esrFrequencyCurve',
    label: 'ESR against frequency from the datasheet',
    fields: [
      {
        type: 'table',
        key: 'points',
        label: 'ESR(f) at 25 °C',
        columns: [
          { key: 'frequencyHz', label: 'Frequency', unit: 'Hz' },
          { key: 'esrOhm', label: 'ESR', unit: 'Ω' },
        ],
        minRows: CURVE_POINTS.min,
        maxRows: CURVE_POINTS.max,
        logX: true,
        logY: true,
        help: 'Frequency rising, ESR above 0 Ω. When given, each harmonic of the capacitor current meets the ESR at its own frequency and the single ESR above is not used for the loss; the end values are held outside the table (the result warns when the switching frequency lies outside it).',
      },
    ],
    // A starting curve around the single ESR (invented): higher at low frequency, flat above fs; paste the datasheet's over it.
    defaults: (part) => {
      const esr = Number(part.esrOhm) || 0.01;
      return { points: [1e3, 1e4, 1e5, 1e6, 1e7].map((frequencyHz, k) => ({ frequencyHz, esrOhm: esr * [4, 2, 1.2, 1, 1][k]! })) };
    },
  },
  {
    type: 'group',
    key: 'esrTemperatureCurve',
    label: 'ESR against temperature from the datasheet',
    fields: [
      {
        type: 'table',
        key: 'points',
        label: 'ESR(T) / ESR(25 °C)',
        columns: [
          { key: 'tC', label: 'Temperature', unit: '°C' },
          { key: 'ratio', label: 'Ratio', unit: '' },
        ],
        minRows: CURVE_POINTS.min,
        maxRows: CURVE_POINTS.max,
        help: 'Temperature rising, ratio above 0 (1 at 25 °C). When given it replaces the ESR change per kelvin; the end ratios are held outside the table (the result warns).',
      },
    ],
    // A starting curve from the coefficient above (straight, floored at 0.1): edit or paste the datasheet's over it.
    defaults: (part) => {
      const c = Number(part.esrTempCoPerK) || 0;
      return { points: [-40, 25, 105].map((tC) => ({ tC, ratio: Math.max(0.1, 1 + c * (tC - 25)) })) };
    },
  },
  num('rippleRatingA', 'Ripple current rating', 'A'),
  num('voltageRatingV', 'Voltage rating', 'V'),
  num('tMaxC', 'Maximum temperature', '°C'),
  {
    type: 'group',
    key: 'life',
    label: 'Rated life (electrolytic, polymer)',
    fields: [num('ratedHours', 'Rated life', 'h'), num('ratedC', 'At temperature', '°C')],
    defaults: () => ({ ratedHours: 2000, ratedC: 105 }),
  },
];

const resistor: FieldSpec[] = [
  num('resistanceOhm', 'Resistance', 'Ω'),
  num('tempCoPerK', 'Temperature coefficient', '/K'),
  num('powerRatingW', 'Power rating', 'W'),
  num('deratingStartC', 'Derating starts at', '°C'),
  num('zeroPowerC', 'Zero power at', '°C'),
];

const controller: FieldSpec[] = [
  num('quiescentA', 'Quiescent current', 'A'),
  num('driveV', 'Gate drive voltage', 'V'),
  num('pullUpOhm', 'Driver pull-up resistance', 'Ω'),
  num('pullDownOhm', 'Driver pull-down resistance', 'Ω'),
  { type: 'boolean', key: 'driveFromVinLinear', label: 'Drive rail made from Vin by a linear regulator' },
  num('tjMaxC', 'Tj max', '°C'),
];

export const PART_FIELDS: Record<PartKind, { identity: FieldSpec[]; values: FieldSpec[] }> = {
  mosfet: { identity, values: [...mosfet, notes] },
  diode: { identity, values: [...diode, notes] },
  inductor: { identity, values: [...inductor, notes] },
  capacitor: { identity, values: [...capacitor, notes] },
  resistor: { identity, values: [...resistor, notes] },
  controller: { identity, values: [...controller, notes] },
};

export const KIND_LABELS: Record<PartKind, { one: string; many: string }> = {
  mosfet: { one: 'MOSFET', many: 'MOSFETs' },
  diode: { one: 'Diode', many: 'Diodes' },
  inductor: { one: 'Inductor', many: 'Inductors' },
  capacitor: { one: 'Capacitor', many: 'Capacitors' },
  resistor: { one: 'Resistor', many: 'Resistors' },
  controller: { one: 'Controller', many: 'Controllers' },
};
