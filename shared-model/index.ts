/**
 * WattLedger engine: the whole public surface. The renderer, main process, command line and tests
 * import from here only (never deep paths). Each section is owned by one concept; keep it sorted.
 */

// --- units ---
export type * from './units/quantities.ts';
export type { EngineeringParse } from './units/engineering.ts';
export { formatEngineering, parseEngineering } from './units/engineering.ts';

// --- warnings ---
export type { Severity, Warning, WarningCode } from './warnings.ts';

// --- design document ---
export * from './design/parts.ts';
export * from './design/schema.ts';
export type { QuantityName, QuantityRange } from './design/numbers.ts';
export { unitOfPath } from './design/key-units.ts';
export type { DesignNotice, Problem } from './design/problems.ts';
export { describeValue } from './design/problems.ts';
export type { NumberRange } from './design/number-range.ts';
export { inRange, rangeText } from './design/number-range.ts';
export type { ConditionKey, ConditionOverrides, FieldRange } from './design/overrides.ts';
export { checkConditionOverrides, CONDITION_RANGES } from './design/overrides.ts';
export {
  CONDITION_LABELS,
  CONTACT_LABEL,
  designFieldLabel,
  HEATSINK_LABELS,
  IDENTITY_LABELS,
  MARGIN_LABELS,
  PULSE_SKIPPING_LABELS,
  SPEC_LABELS,
  TARGET_LABELS,
  THERMAL_PATH_LABELS,
  TOPOLOGY_LABELS,
} from './design/field-labels.ts';
export { pathMessage } from './design/labelled-problems.ts';

export type { DesignValidation } from './design/validate.ts';
export { validateDesign } from './design/validate.ts';
export type { MigrationResult } from './design/migrate.ts';
export { parseDesignText, serializeDesign } from './design/document-text.ts';
export type { JsonSyntaxError } from './design/json-position.ts';
export { freeId, idFromName } from './design/ids.ts';
export type { PartsLibrary, PartsLibraryValidation } from './design/parts-library.ts';
export {
  PARTS_LIBRARY_FORMAT,
  PARTS_LIBRARY_VERSION,
  partsLibrarySchema,
  partsOfKind,
  validatePartsLibrary,
} from './design/parts-library.ts';
export type { LibraryMigration } from './design/parts-library-migrate.ts';
export { parsePartsLibraryText, serializePartsLibrary } from './design/parts-library-text.ts';
export { DESIGN_SCHEMA_FILE, designJsonSchema, PARTS_SCHEMA_FILE, partsLibraryJsonSchema } from './design/json-schema.ts';
export type { DemoDesign } from './design/demos.ts';
export { DEMO_DESIGNS, DEMO_PARTS_LIBRARY } from './design/demos.ts';

// --- library links (a design's parts against their library entries) ---
export type { FieldDifference, LinkState, PartLink } from './library-links/link-status.ts';
export { linkStatus } from './library-links/link-status.ts';
export { takeLibraryPart, unlinkPart, updateFromLibrary } from './library-links/update-link.ts';

// --- part import and export (spreadsheets) ---
export type { FieldType, PartField } from './part-import/fields.ts';
export { fieldsOfKind, PART_FIELDS, partField } from './part-import/fields.ts';
export { KIND_WORDS } from './part-import/field-labels.ts';
export type { HeaderParts } from './part-import/header-unit.ts';
export type { CellRead } from './part-import/cells.ts';
export type { ColumnMapping, MappingProblem, PartMapping } from './part-import/mapping.ts';
export { checkMapping, mappingDocument, PART_MAPPING_FORMAT, PART_MAPPING_VERSION, partMappingSchema } from './part-import/mapping.ts';
export { guessMapping, reuseMapping } from './part-import/guess.ts';
export type { ImportPreview, PreviewRow, RowProblem } from './part-import/preview.ts';
export { previewImport } from './part-import/preview.ts';
export type { ImportApplied } from './part-import/apply.ts';
export { applyImport } from './part-import/apply.ts';
export { partsToCsv } from './part-import/export.ts';

// --- operating point ---
export type * from './operating-point/types.ts';
export { solveOperatingPoint } from './operating-point/solve.ts';
export { TOPOLOGIES, topologyOf } from './topology/registry.ts';
export type { ConductionInterval, ConverterTopology, VoltageCoefficients } from './topology/types.ts';
export { conductionParameters, nominalConditions, uniformTemps } from './operating-point/conditions.ts';
export { isSynchronous } from './operating-point/circuit.ts';
export { waveformStats, periodOf } from './waveform/stats.ts';
export { constantWaveform, offsetWaveform, scaleWaveform, segment, waveformOf } from './waveform/build.ts';
export type { VoltageRipple } from './waveform/voltage-ripple.ts';
export { capacitorVoltageRipple } from './waveform/voltage-ripple.ts';
export {
  copperResistanceAt,
  diodeVf0At,
  esrAt,
  leakageAt,
  rdsOnAt,
  resistorAt,
} from './physics/temperature-laws.ts';

// --- ledger ---
export type * from './ledger/types.ts';
export type { EvaluateOptions, LedgerEvaluator } from './ledger/evaluate.ts';
export { evaluate, ledgerEvaluator, POWER_BALANCE_RTOL } from './ledger/evaluate.ts';
export type { LeanEvaluation, LeanHazard, LeanTerm } from './ledger/lean-evaluate.ts';
export type { RegulationFlags } from './ledger/regulated.ts';
export { isRegulated, isUsablePoint, REGULATION_RTOL, unusableReason } from './ledger/regulated.ts';
export { RUNAWAY_BAND_K } from './thermal/fixed-point.ts';
export { TOUCH_LIMITS } from './hazards/touch-limits.ts';
export type { RowFit } from './hazards/touch-check.ts';
export { hazardCaution, touchLimitFor } from './hazards/touch-check.ts';
export { electrolyticLifeHours, isatAt, resistorRatingAt } from './hazards/ratings.ts';

// --- sweeps, comparison, tolerance ---
export type {
  HazardColumn,
  LoadSweep,
  LoadSweepOptions,
  LossColumn,
  OptionProblem,
  PointEvaluator,
  SweepColumns,
  SweepPoint,
  SweepSpacing,
  TemperatureColumn,
} from './sweep/types.ts';
export { axisValues, MAX_AXIS_POINTS } from './sweep/spacing.ts';
export { evaluatorFor } from './sweep/evaluator.ts';

export {
  checkLoadSweepOptions,
  sweepLoad,
} from './sweep/load-sweep.ts';
export type { FamilyMember, FamilyOptions, SweepFamilies } from './sweep/families.ts';
export { sweepFamilies } from './sweep/families.ts';
export type { FrequencySide, FrequencySweep, FrequencySweepOptions } from './sweep/frequency-sweep.ts';
export { checkFrequencySweepOptions, sweepFrequency } from './sweep/frequency-sweep.ts';
export type { AxisOptions, GridAxis, GridOptions, LoadGrid } from './sweep/grid.ts';
export { checkGridOptions, sweepGrid } from './sweep/grid.ts';
export type { EfficiencyPoint, Figure, FigureOfMeritPoint, FiguresOfMerit } from './sweep/figures-of-merit.ts';
export {
  AVERAGE_EFFICIENCY_FRACTIONS,
  figuresOfMerit,
  figuresOfMeritOf,
  figureValue,
  LIGHT_LOAD_FRACTION,
} from './sweep/figures-of-merit.ts';
export type {
  KneeLandmark,
  Landmark,
  Landmarks,
  PartCeiling,
  RegulationLandmark,
  ThermalCeilingLandmark,
} from './landmarks/types.ts';
export type { LandmarkOptions } from './landmarks/find-landmarks.ts';
export { findLandmarks, loadProbe } from './landmarks/find-landmarks.ts';
export type { SweepLandmarkOptions, SweepWithLandmarks } from './landmarks/sweep-with-landmarks.ts';
export { sweepWithLandmarks } from './landmarks/sweep-with-landmarks.ts';
export type { PeakResult } from './landmarks/peak.ts';
export { findPeak } from './landmarks/peak.ts';
export { DEFAULT_KNEE_THRESHOLD_POINTS, findKnee, kneeDefinition } from './landmarks/knee.ts';
export { findModeBoundary } from './landmarks/mode-boundary.ts';
export { findThermalCeiling, hasFixedPoint } from './landmarks/thermal-ceiling.ts';


export type { Substitution } from './compare/substitute-part.ts';
export { partInRole, ROLE_KINDS, substitutePart } from './compare/substitute-part.ts';
export type { Crossover } from './compare/crossover.ts';
export { findCrossovers, winnersOf } from './compare/crossover.ts';
export type {
  CompareAlternative,
  CompareCrossover,
  CompareOptions,
  Comparison,
  ComparisonOutcome,
} from './compare/compare-parts.ts';
export { compareParts } from './compare/compare-parts.ts';
export type { RatingLimit, RoleStress } from './compare/role-fit.ts';
export { DEFAULT_CURRENT_DERATING, ratingLimits, ratingShortfalls, stressOf } from './compare/role-fit.ts';
export type { RandomSource } from './tolerance/prng.ts';
export type { SampleHistogram, SampleSummary } from './tolerance/statistics.ts';
export type { ResolvedTolerances, SpreadKey, ToleranceRange, Tolerances, Variation } from './tolerance/variation.ts';
export { checkTolerances, DEFAULT_AMBIENT_SPREAD_K, DEFAULT_SPREADS, describeVariation } from './tolerance/variation.ts';
export type { CornerTemperature, ToleranceCorner, WorstCase, WorstCaseOptions } from './tolerance/worst-case.ts';
export { cornerVariations, worstCase } from './tolerance/worst-case.ts';
export type { MonteCarlo, MonteCarloDistribution, MonteCarloOptions, MonteCarloSampleChunk, PartDistribution } from './tolerance/monte-carlo.ts';
export {
  checkMonteCarloOptions,
  DEFAULT_MONTE_CARLO_SAMPLES,
  DEFAULT_MONTE_CARLO_SEED,
  MAX_MONTE_CARLO_SAMPLES,
  monteCarlo,
  runMonteCarloSamples,
  summarizeMonteCarlo,
} from './tolerance/monte-carlo.ts';

// --- interleaved phases (issue 13 §1) ---
export type * from './interleave/types.ts';
export type { PhaseOptions } from './interleave/evaluate-phases.ts';
export { evaluatePhases } from './interleave/evaluate-phases.ts';
export { delayWaveform, interleavedSum, sumWaveforms } from './interleave/phase-shift.ts';
export { phaseCount, phaseDesign, phaseLoads } from './interleave/phase-design.ts';
export { asEvaluation } from './interleave/as-evaluation.ts';
export type { PhaseSelection } from './interleave/phase-evaluator.ts';
export { designPointEvaluator, designSelection, evaluateDesign, optimalPhases, phasedEvaluator } from './interleave/phase-evaluator.ts';
export type { PhaseSummary, SharedCurrentSummary } from './interleave/summary.ts';
export { phaseSummary } from './interleave/summary.ts';
export type { PhaseCurve, PhaseCurvePoint, PhaseShedding, SheddingOptions, ShedLandmark } from './interleave/shedding.ts';
export { findCrossover, phaseShedding, SHEDDING_DEFINITION, SUGGESTED_HYSTERESIS } from './interleave/shedding.ts';

// --- sizing from the specification ---
export type * from './sizing/types.ts';
export type { SolvedCorner } from './sizing/corners.ts';
export { cornerVoltages, solveCorners } from './sizing/corners.ts';
export { chargeAboveMean } from './sizing/capacitors.ts';
export { DEFAULT_RIPPLE_RATIO } from './sizing/inductor.ts';
export type { SizingOptions } from './sizing/size-design.ts';
export { sizeDesign, sizeFromCorners } from './sizing/size-design.ts';
export type { HandInput, HandSizing } from './sizing/hand-method.ts';
export { handSizing } from './sizing/hand-method.ts';
export type { SizingRow } from './sizing/rows.ts';
export { sizingRows } from './sizing/rows.ts';

// --- mission profile (issue 11 §4) ---
export type { MissionProfile, MissionRow } from './mission/schema.ts';
export { MAX_MISSION_ROWS, missionProfileSchema } from './mission/schema.ts';
export type { WeightingId, WeightingSet } from './mission/weightings.ts';
export { profileFromWeighting, ratedPointProfile, WEIGHTING_SETS, weightingSet } from './mission/weightings.ts';
export { FRACTION_SUM_TOLERANCE } from './mission/rules.ts';
export type * from './mission/types.ts';
export type { MissionOptions } from './mission/evaluate-mission.ts';
export { evaluateMission } from './mission/evaluate-mission.ts';

// --- the library ranked for a role (issue 11 §3) ---
export type * from './ranking/types.ts';
export { RANK_SCORES } from './ranking/types.ts';
export { assembleRanking, checkRankOptions, DEFAULT_RANK_SCORE, judgeChunk, libraryChunks, rankLibrary } from './ranking/rank-library.ts';

// --- design checks: the chosen parts and the targets against the sizing ---
export type * from './design-checks/types.ts';
export { reviewDesign } from './design-checks/review.ts';

// --- bench measurements and calibration ---
export type { CalibrationRecord, MeasuredPoint, MeasuredTemperatures, Measurement } from './measurement/schema.ts';
export { calibrationSchema, measuredPointSchema, measurementSchema } from './measurement/schema.ts';
export type { ColumnKey, ColumnSpec } from './measurement/columns.ts';
export { columnOf, COLUMNS as MEASUREMENT_COLUMNS, INPUT_COLUMNS, REQUIRED_COLUMNS } from './measurement/columns.ts';
export type { MeasurementProblem, MeasurementRead, ReadMeasurementOptions } from './measurement/read.ts';
export { inputPowerOf, readMeasurement } from './measurement/read.ts';
export type { MeasuredBalance } from './measurement/loss.ts';
export { measuredBalance } from './measurement/loss.ts';
export { measurementHash, measurementText } from './measurement/hash.ts';
export type { LeastSquaresOptions, LeastSquaresProblem, LeastSquaresResult, StopReason } from './fit/least-squares.ts';
export type { IdentifiabilityIssue, ParameterStatistics } from './fit/intervals.ts';
export { CORRELATION_LIMIT } from './fit/intervals.ts';
export type { FitParameter, FitParameterName } from './fit/parameters.ts';
export { defaultFitParameters, fitParameters, SCALE_BOUNDS } from './fit/parameters.ts';
export type * from './fit/types.ts';
export type { CalibrationOptions, CalibrationOutcome } from './fit/calibrate.ts';
export { calibrate } from './fit/calibrate.ts';
export { modelPoints } from './fit/point-model.ts';

export { CALIBRATION_CAUTION } from './fit/caution.ts';
export type { CalibrationSection, CalibrationSectionPoint } from './fit/report-section.ts';
export { calibrationSection } from './fit/report-section.ts';

// --- design-review report ---
export type * from './report/types.ts';
export { REPORT_FORMAT, REPORT_VERSION } from './report/types.ts';
export type { ReportInput } from './report/build.ts';
export { buildReport } from './report/build.ts';
export type { MethodSelection } from './report/methods.ts';
export { SHORT_CAUTION } from './report/cautions.ts';
export { ledgerCsv, sweepCsv } from './report/csv.ts';
export type { CsvCell } from './csv/write.ts';
export { csvLines } from './csv/write.ts';
export type { CsvReadProblem, CsvRow, CsvTable } from './csv/read.ts';
export { readCsv } from './csv/read.ts';
export { sha256 } from './report/sha256.ts';
export { CHECK_LABELS, CONTACT_LABELS, describePath, ROLE_LABELS, roleLabel } from './report/labels.ts';
export {
  balanceDecimals,
  formatAmps,
  formatCelsius,
  formatDuty,
  formatFigurePercent,
  formatHertz,
  formatHours,
  formatKelvin,
  formatMarginFraction,
  formatPercent,
  formatQuantity,
  formatVolts,
  formatWatts,
  formatWattsFixed,
} from './report/format.ts';

// --- desktop API contract (types only) ---
export type * from './desktop-api.ts';
export { curveReadings, type CurveReading } from './curves/readings.ts';
