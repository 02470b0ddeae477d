/**
 * The demo designs and the invented parts library that ship in assets/, as plain imported JSON (no file
 * system needed: the renderer's bundler, Vitest and tsx all inline JSON imports). They are untyped on
 * purpose: pass them through validateDesign / validatePartsLibrary like any file a user opens.
 */
import diodeBoost from '../../assets/designs/diode-boost.json';
import hotFinBuck from '../../assets/designs/hot-fin-buck.json';
import multiphaseBuck from '../../assets/designs/multiphase-buck.json';
import synchronousBuck from '../../assets/designs/synchronous-buck.json';
import partsLibrary from '../../assets/parts/library.json';

export interface DemoDesign {
  /** File name without extension in assets/designs/. */
  id: string;
  title: string;
  /** What the demo is for. */
  purpose: string;
  json: unknown;
}

export const DEMO_DESIGNS: readonly DemoDesign[] = [
  {
    id: 'synchronous-buck',
    title: 'Field instrument 3.3 V rail (synchronous buck)',
    purpose: 'The default demo: a 4-cell lithium-ion pack to 3.3 V at 5 A, 450 kHz, both MOSFETs on the case wall.',
    json: synchronousBuck,
  },
  {
    id: 'diode-boost',
    title: 'Portable work light 12 V bus (diode boost)',
    purpose: 'One lithium-ion cell to 12 V at 1 A, 550 kHz, MOSFET and Schottky on the lamp body.',
    json: diodeBoost,
  },
  {
    id: 'hot-fin-buck',
    title: 'Bench accessory 5 V supply with an exposed clip fin',
    purpose: 'Touch-hazard example: every part within its limits, but the exposed fin is too hot to touch.',
    json: hotFinBuck,
  },
  {
    id: 'multiphase-buck',
    title: 'Motion-controller backplane 1.8 V rail (four-phase buck)',
    purpose: 'Interleaving: 12 V bus to 1.8 V at 60 A in four phases at 400 kHz with shared banks and fin, ±5 % sharing, phases shed at light load.',
    json: multiphaseBuck,
  },
];

/** The invented parts library (assets/parts/library.json) as parsed JSON. */
export const DEMO_PARTS_LIBRARY: unknown = partsLibrary;
