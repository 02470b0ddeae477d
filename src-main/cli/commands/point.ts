/**
 * `wattledger point DESIGN.json [--json] [--vin V] [--load A] [--fs Hz] [--ambient °C]`: the converter's operating
 * point with every part at the ambient temperature (no self-heating, duty from volt-second balance with
 * the resistive and diode drops). JSON: { command, design, conditions, partTemperaturesC, conduction,
 * operatingPoint, designNotices, cautions } — the engine's records unchanged (README.md, "point").
 */
import type { PartTemps } from '../../../shared-model/index.ts';
import { conductionParameters, nominalConditions, solveOperatingPoint } from '../../../shared-model/index.ts';
import { CAUTIONS } from '../cautions.ts';
import type { Command } from '../command.ts';
import { loadDesign } from '../design-file.ts';
import { EXIT } from '../io.ts';
import { CONDITION_FLAGS, conditionOverrides, overridesFit } from './conditions.ts';
import { renderPoint } from './point-view.ts';

export const pointCommand: Command = {
  name: 'point',
  summary: 'Operating point: duty cycle, mode, currents, stresses and ripple, parts at ambient.',
  positionals: ['DESIGN.json'],
  flags: CONDITION_FLAGS,
  details: [
    'Every part is taken at the ambient temperature (no self-heating); use "evaluate" for the',
    'electro-thermal result with losses and temperatures.',
  ],
  async run(args, io) {
    const loaded = await loadDesign(args.positionals[0] ?? '', io, 'wattledger point');
    if (!loaded.ok) return EXIT.invalidDesign;
    const { design } = loaded;
    const overrides = conditionOverrides(args);
    if (!overridesFit(design, overrides, io, 'wattledger point')) return EXIT.usage;
    const conditions = nominalConditions(design, overrides);
    const t = conditions.ambientC;
    const partTemperaturesC: PartTemps = { switchC: t, rectifierC: t, inductorC: t, senseC: t };
    const conduction = conductionParameters(design, partTemperaturesC);
    const operatingPoint = solveOperatingPoint(design, conditions, conduction);
    if (args.switches.has('json')) {
      const record = {
        command: 'point',
        design: design.name,
        conditions,
        partTemperaturesC,
        conduction,
        operatingPoint,
        designNotices: loaded.notices,
        cautions: CAUTIONS,
      };
      io.out(JSON.stringify(record, null, 2));
    } else io.out(renderPoint(design, operatingPoint, loaded.notices));
    return EXIT.ok;
  },
};
