/** The caution every view of a calibration carries (app, report, command line). */
export const CALIBRATION_CAUTION =
  'A fit is only as good as the measurements: it explains one prototype at the measured conditions, with the ' +
  'instruments and their errors that measured it. The intervals are approximate (linearised at the solution) and ' +
  'assume independent measurement errors of equal size within each kind. Do not carry fitted values to another ' +
  'board, layout, part batch or operating range without measuring again; temperatures and ratings still have to be ' +
  'confirmed on hardware against the applicable standards, local codes and licensed practice.';
