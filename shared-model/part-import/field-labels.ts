/**
 * The words of the part fields for import and export: an on-screen label for each field of a part
 * record (dotted path inside the part, design/parts.ts) and the header spellings a spreadsheet may use
 * for it. Labels use trade terms (RDS(on), Qg, θJC, DCR, ESR, Isat ...) and are unique, so an exported
 * header names exactly one field. Aliases are compared after `normaliseHeader` (case, spaces, punctuation
 * and units ignored), so "Rds(on) (mOhm)", "RDS_ON" and "rds on" all meet the alias "rdson".
 */

export interface FieldWords {
  label: string;
  aliases: readonly string[];
}

export const FIELD_WORDS: Readonly<Record<string, FieldWords>> = {
  kind: { label: 'Kind', aliases: ['type', 'part kind', 'part type', 'category'] },
  id: { label: 'Identifier', aliases: ['id', 'part id', 'part number', 'part no', 'part #', 'pn', 'p/n', 'mpn', 'item', 'code'] },
  name: { label: 'Name', aliases: ['part name', 'description', 'desc', 'title'] },
  invented: { label: 'Invented example', aliases: ['invented', 'example', 'demo'] },
  notes: { label: 'Notes', aliases: ['note', 'comment', 'comments', 'remarks'] },
  // --- MOSFET ---
  vdsRatingV: { label: 'VDS rating', aliases: ['vds', 'vds max', 'vdss', 'bvdss', 'drain source voltage', 'vds rating'] },
  idRatingA: { label: 'ID rating', aliases: ['id max', 'id rating', 'drain current', 'continuous drain current', 'id cont'] },
  rdsOn25Ohm: { label: 'RDS(on) at 25 °C', aliases: ['rds(on)', 'rdson', 'rds on', 'rds(on) 25c', 'rdson 25', 'on resistance', 'rds(on) typ', 'rds(on) max'] },
  'rdsTemperatureLaw.law': { label: 'RDS(on) temperature law', aliases: ['rds law', 'rds(on) law', 'rds temperature law'] },
  'rdsTemperatureLaw.alphaPerK': { label: 'RDS(on) coefficient α', aliases: ['rds tempco', 'rds(on) tempco', 'rdson tempco', 'rds alpha', 'alpha rds'] },
  'rdsTemperatureLaw.exponent': { label: 'RDS(on) exponent', aliases: ['rds exponent', 'rds(on) exponent'] },
  'rdsTemperatureLaw.shape': { label: 'RDS(on) two-point shape', aliases: ['rds shape'] },
  'rdsTemperatureLaw.hotC': { label: 'RDS(on) hot point temperature', aliases: ['rds hot temperature', 'rds(on) hot temp', 'hot point'] },
  'rdsTemperatureLaw.hotRatio': { label: 'RDS(on) ratio at hot point', aliases: ['rds hot ratio', 'rds(on) ratio', 'rds ratio'] },
  qgC: { label: 'Total gate charge Qg', aliases: ['qg', 'gate charge', 'total gate charge', 'qg total'] },
  qgs2C: { label: 'Qgs2 (after threshold)', aliases: ['qgs2'] },
  qgsC: { label: 'Qgs', aliases: ['qgs', 'gate source charge'] },
  qgdC: { label: 'Gate-drain charge Qgd', aliases: ['qgd', 'gate drain charge', 'miller charge'] },
  vthV: { label: 'Threshold voltage', aliases: ['vth', 'vgs(th)', 'vgsth', 'threshold', 'gate threshold'] },
  plateauV: { label: 'Plateau voltage', aliases: ['vplateau', 'vpl', 'plateau', 'miller plateau', 'vgp'] },
  rgInternalOhm: { label: 'Internal gate resistance', aliases: ['rg', 'rg internal', 'rg int', 'gate resistance'] },
  'outputCapacitance.kind': { label: 'Output capacitance form', aliases: ['coss form'] },
  'outputCapacitance.cossF': { label: 'Coss', aliases: ['coss', 'output capacitance'] },
  'outputCapacitance.qossC': { label: 'Qoss', aliases: ['qoss', 'output charge'] },
  'outputCapacitance.eossJ': { label: 'Eoss', aliases: ['eoss', 'output energy'] },
  'outputCapacitance.points': { label: 'Coss(VDS) table (JSON)', aliases: ['coss table', 'coss curve'] },
  'outputCapacitance.atV': { label: 'Coss measured at', aliases: ['coss at', 'coss vds', 'coss voltage', 'vds for coss'] },
  bodyDiodeVsdV: { label: 'Body diode VSD', aliases: ['vsd', 'body diode vf', 'body diode forward voltage'] },
  bodyDiodeQrrC: { label: 'Body diode Qrr', aliases: ['qrr', 'body diode qrr'] },
  bodyDiodeQrrTestA: { label: 'Body diode Qrr test current', aliases: ['qrr test current', 'qrr if', 'qrr at'] },
  tjMaxC: { label: 'Tj max', aliases: ['tjmax', 'tj', 'max junction temperature', 'junction temperature max'] },
  thetaJcKPerW: { label: 'θJC', aliases: ['thetajc', 'rthjc', 'rth(j-c)', 'rth jc', 'junction to case'] },
  // --- diode ---
  technology: { label: 'Technology', aliases: ['diode type', 'diode technology'] },
  vf0V: { label: 'Forward voltage VF0', aliases: ['vf', 'vf0', 'forward voltage', 'vf typ'] },
  rdOhm: { label: 'Slope resistance Rd', aliases: ['rd', 'slope resistance', 'dynamic resistance'] },
  vfTempCoVPerK: { label: 'VF0 temperature coefficient', aliases: ['vf tempco', 'vf temperature coefficient'] },
  qrrC: { label: 'Reverse-recovery charge Qrr', aliases: ['qrr', 'recovery charge', 'reverse recovery charge'] },
  qrrTestA: { label: 'Qrr test current', aliases: ['qrr test current', 'qrr if', 'qrr at'] },
  cjF: { label: 'Junction capacitance Cj', aliases: ['cj', 'ct', 'junction capacitance'] },
  leakageA: { label: 'Reverse leakage', aliases: ['ir', 'leakage', 'reverse current', 'reverse leakage current'] },
  leakageAtC: { label: 'Leakage measured at', aliases: ['leakage temperature', 'ir at', 'ir temperature'] },
  leakageDoublingK: { label: 'Leakage doubles every', aliases: ['leakage doubling', 'ir doubling'] },
  vrRatingV: { label: 'VR rating', aliases: ['vr', 'vrrm', 'reverse voltage', 'vr max'] },
  ifRatingA: { label: 'IF rating', aliases: ['if', 'if(av)', 'ifav', 'forward current', 'io'] },
  // --- inductor ---
  inductanceH: { label: 'Inductance', aliases: ['l', 'inductance', 'l0', 'ind'] },
  'rolloff.currentA': { label: 'Roll-off current', aliases: ['rolloff current', 'l drop current'] },
  'rolloff.inductanceH': { label: 'Inductance at roll-off current', aliases: ['rolloff inductance', 'l at rolloff'] },
  dcr20Ohm: { label: 'DCR at 20 °C', aliases: ['dcr', 'dcr typ', 'dcr max', 'rdc', 'winding resistance'] },
  isatA: { label: 'Saturation current Isat', aliases: ['isat', 'saturation current'] },
  isatAtC: { label: 'Isat stated at', aliases: ['isat temperature', 'isat at'] },
  isatTempCoPerK: { label: 'Isat change per kelvin', aliases: ['isat tempco'] },
  irmsRatingA: { label: 'RMS current rating', aliases: ['irms', 'ir', 'rated current', 'irated', 'heating current'] },
  turns: { label: 'Turns', aliases: ['n', 'turns', 'number of turns'] },
  aeM2: { label: 'Core area Ae', aliases: ['ae', 'core area', 'effective area'] },
  veM3: { label: 'Core volume Ve', aliases: ['ve', 'core volume', 'effective volume'] },
  'coreLoss.kind': { label: 'Core loss data', aliases: ['core loss form', 'core loss kind'] },
  'coreLoss.k': { label: 'Steinmetz k', aliases: ['k', 'steinmetz k'] },
  'coreLoss.alpha': { label: 'Steinmetz α', aliases: ['alpha', 'steinmetz alpha'] },
  'coreLoss.beta': { label: 'Steinmetz β', aliases: ['beta', 'steinmetz beta'] },
  'coreLoss.lossWPerM3': { label: 'Core loss density', aliases: ['pv', 'core loss', 'loss density'] },
  'coreLoss.atHz': { label: 'Core loss frequency', aliases: ['pv frequency', 'core loss at'] },
  'coreLoss.atPeakT': { label: 'Core loss peak flux', aliases: ['pv flux', 'bpk', 'peak flux'] },
  'acWinding.kind': { label: 'Winding AC resistance', aliases: ['ac winding', 'winding ac model'] },
  'acWinding.racOverRdc': { label: 'Rac / Rdc at fs', aliases: ['rac/rdc', 'racrdc', 'ac factor'] },
  'acWinding.layers': { label: 'Winding layers', aliases: ['layers'] },
  'acWinding.conductorThicknessM': { label: 'Conductor thickness', aliases: ['conductor thickness', 'foil thickness', 'wire thickness'] },
  'acWinding.porosity': { label: 'Porosity factor', aliases: ['porosity'] },
  tMaxC: { label: 'Maximum temperature', aliases: ['tmax', 't max', 'max temperature', 'operating temperature max', 'temperature max'] },
  // --- capacitor ---
  dielectric: { label: 'Dielectric', aliases: ['dielectric', 'cap type', 'capacitor type'] },
  capacitanceF: { label: 'Capacitance', aliases: ['c', 'cap', 'capacitance', 'value c'] },
  esrOhm: { label: 'ESR at fs', aliases: ['esr', 'esr max', 'esr typ'] },
  esrTempCoPerK: { label: 'ESR change per kelvin', aliases: ['esr tempco'] },
  rippleRatingA: { label: 'Ripple current rating', aliases: ['ripple', 'ripple current', 'iripple', 'irms ripple', 'iac'] },
  voltageRatingV: { label: 'Voltage rating', aliases: ['v rating', 'rated voltage', 'voltage', 'vr cap', 'wv', 'vdc'] },
  'life.ratedHours': { label: 'Rated life', aliases: ['life', 'endurance', 'lifetime', 'load life'] },
  'life.ratedC': { label: 'Rated life temperature', aliases: ['life temperature', 'endurance temperature', 'life at'] },
  // --- resistor ---
  resistanceOhm: { label: 'Resistance', aliases: ['r', 'resistance', 'rsense', 'value r'] },
  tempCoPerK: { label: 'Temperature coefficient', aliases: ['tcr', 'tempco', 'temperature coefficient'] },
  powerRatingW: { label: 'Power rating', aliases: ['p', 'power', 'power rating', 'p rated'] },
  deratingStartC: { label: 'Derating starts at', aliases: ['derating start', 'knee temperature'] },
  zeroPowerC: { label: 'Zero power at', aliases: ['zero power', 'zero power temperature'] },
  // --- controller ---
  quiescentA: { label: 'Quiescent current', aliases: ['iq', 'quiescent', 'supply current'] },
  driveV: { label: 'Gate drive voltage', aliases: ['vdrv', 'vdrive', 'drive voltage', 'gate drive'] },
  pullUpOhm: { label: 'Driver pull-up resistance', aliases: ['rpu', 'pull up', 'rsource', 'driver source resistance'] },
  pullDownOhm: { label: 'Driver pull-down resistance', aliases: ['rpd', 'pull down', 'rsink', 'driver sink resistance'] },
  driveFromVinLinear: { label: 'Drive rail from Vin (linear)', aliases: ['drive from vin', 'ldo from vin', 'linear drive'] },
};

/** The kinds of part in words, for the Kind column (either the key or this word is accepted). */
export const KIND_WORDS = {
  mosfet: 'MOSFET',
  diode: 'Diode',
  inductor: 'Inductor',
  capacitor: 'Capacitor',
  resistor: 'Resistor',
  controller: 'Controller',
} as const;
