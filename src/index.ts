/** The public API of conformark: explicit named exports only. The CLI uses nothing else. */
export const VERSION = '0.1.0';

export type { Atom, Bond, Molecule, RecordSource, FormatName, Vec3 } from './model/molecule.js';
export { atomPosition } from './model/molecule.js';
export { ConformarkError, ParseError, formatIssue, usageError } from './model/errors.js';
export type { Issue, Warning } from './model/errors.js';
export { elementInfo, elementByNumber, atomicMass } from './model/elements.js';
export type { ElementInfo } from './model/elements.js';
export { torsion, torsionRad } from './geometry/torsion.js';
export { klynePrelog, torsionRelation } from './geometry/klynePrelog.js';
export type { KlynePrelog, TorsionRelation } from './geometry/klynePrelog.js';
export { wrap180, wrap360 } from './geometry/vec3.js';
export { writeAtomic, protectInput } from './io/writeAtomic.js';
export { abandonOutputs } from './io/abandonOutputs.js';
export { buildGraph } from './perceive/graph.js';
export type { Graph } from './perceive/graph.js';
export {
  cremerPople,
  meanPlane,
  displacementsFromModes,
  sixRingModes,
  ringFromDisplacements,
  PHASE_THRESHOLD,
} from './geometry/cremerPople.js';
export type { Puckering, PuckeringMode } from './geometry/cremerPople.js';

// couplings + ensembles (area E)
export { KARPLUS_FORMS, karplusJ } from './analysis/karplus.js';
export type { KarplusForm, KarplusMethod } from './analysis/karplus.js';
export {
  HAASNOOT_SETS,
  FLUORINE_CHI_DEFAULT,
  FLUORINE_CHI_ALTERNATIVE,
  haasnootJ,
  haasnootSetFor,
  hugginsElectronegativity,
  isHaasnootSet,
  substituentOrientation,
} from './analysis/haasnoot.js';
export type { HaasnootParameters, HaasnootSet, HaasnootTerm } from './analysis/haasnoot.js';
export {
  COUPLING_METHODS,
  COUPLING_METHOD_NAMES,
  COUPLING_METHOD_SHORT_NAMES,
  couplingsAcrossBond,
  isSkippedCoupling,
  noHydrogenWarning,
  ringCouplings,
  toCouplingJson,
  vicinalCoupling,
} from './analysis/coupling.js';
export type {
  Coupling,
  CouplingJson,
  CouplingMethod,
  CouplingOptions,
  CouplingResult,
  SkippedCoupling,
} from './analysis/coupling.js';
export {
  ENERGY_UNITS,
  GAS_CONSTANT_KCAL,
  GAS_CONSTANT_KJ,
  boltzmannPopulations,
  convertEnergy,
  ensembleAverage,
} from './analysis/boltzmann.js';
export type { BoltzmannOptions, BoltzmannResult } from './analysis/boltzmann.js';
export type { EnergyUnit } from './model/energyUnits.js';
export { superpose, applyMat3 } from './analysis/superpose.js';
export type { Mat3, Superposition } from './analysis/superpose.js';
export { heavyAtomRmsd } from './analysis/rmsd.js';
export type { ConformerRmsd, RmsdOptions } from './analysis/rmsd.js';
export { findDuplicates } from './analysis/duplicates.js';
export type { DuplicateOptions } from './analysis/duplicates.js';
export { torsionFingerprint, compareTorsionFingerprints } from './analysis/torsionFingerprint.js';
export type { FingerprintDifference, TorsionAtoms } from './analysis/torsionFingerprint.js';
// rings (area C): ring reference order, canonical forms, shape and descriptor, substituents, pseudorotation
export { altonaSundaralingam, altonaSundaralingamFit, fourierPseudorotation, leastSquaresAmplitude } from './geometry/pseudorotation.js';
export type { AltonaSundaralingamFit, AmplitudeMethod, Pseudorotation } from './geometry/pseudorotation.js';
export { ringReference } from './analysis/ringReference.js';
export type { RingReference, RingReferenceOptions } from './analysis/ringReference.js';
export {
  SIX_RING_FORMS,
  FIVE_RING_FORMS,
  THETA_HALF_CHAIR,
  THETA_ENVELOPE,
  THETA_SCREW_BOAT,
} from './analysis/ringForms.js';
export type { RingShape, FormLetter, ReferencePlane, CanonicalForm } from './analysis/ringForms.js';
export { formDescriptor, chosenPlane } from './analysis/ringDescriptor.js';
export type { DescriptorParts, RingDescriptor } from './analysis/ringDescriptor.js';
export { classifyRing } from './analysis/ringShape.js';
export type { RingShapeOptions, RingClassification, FormFit, NearForm } from './analysis/ringShape.js';
export { ringSubstituents, relativeConfiguration } from './analysis/substituents.js';
export type { RingSubstituent, SubstituentPosition, SubstituentOptions } from './analysis/substituents.js';
export { analyzeRing } from './analysis/ringAnalysis.js';
export type {
  AnalyzeRingOptions,
  RingAnalysis,
  RingPuckering,
  PseudorotationMethod,
} from './analysis/ringAnalysis.js';
export { chemicalNumbering } from './analysis/chemicalNumbering.js';
export type { ChemicalNumbering } from './analysis/chemicalNumbering.js';
export { toReportRing } from './analysis/ringReport.js';
export type { ReportRing } from './analysis/ringReport.js';
// build (area F): SD writer and 3D conformers from SMILES
export { formatSdf } from './io/writeSdf.js';
export type { SdfOptions } from './io/writeSdf.js';
export { buildConformers, BUILD_ENERGY_FIELD } from './api/build/build.js';
export type { BuildOptions, BuildResult } from './api/build/build.js';
// newman + render (area D)
export { newmanView, heaviestAtom, ECLIPSED_MAX_DEG, STAGGERED_MIN_DEG } from './analysis/newman.js';
export type { NewmanOptions, NewmanView, NewmanSubstituent, NewmanPair, NewmanConformation } from './analysis/newman.js';
export { toNewmanJson } from './analysis/newmanJson.js';
export type { NewmanJson, NewmanJsonOptions, NewmanCouplingInput } from './analysis/newmanJson.js';
export { layoutNewman } from './layout/newman/newmanLayout.js';
export type { NewmanLayoutOptions, NewmanHydrogens } from './layout/newman/newmanLayout.js';
export type { NewmanAngles } from './layout/newman/newmanAngles.js';
export type { NewmanLabels } from './layout/text/atomLabelText.js';
export { torsionArcPath } from './layout/newman/torsionArc.js';
export { approximateMeasure, textStyle, DEFAULT_METRICS } from './layout/scene.js';
export type { Scene, SceneItem, SceneLine, ScenePath, SceneCircle, SceneText, SceneMetrics, TextMeasure, TextRun, TextStyle, FontWeight } from './layout/scene.js';
export { figureLegibility, textItemBox } from './layout/text/figureLegibility.js';
export type { Legibility, LegibilityCounts, LegibilityOptions, LegibilityProblem } from './layout/text/figureLegibility.js';
export { textRuns, runsText, MIN_TEXT_SIZE } from './layout/text/textRuns.js';
export { renderSvg } from './render/renderSvg.js';
export type { RenderSvgOptions } from './render/renderSvg.js';
export { renderPng, pngResolution, DEFAULT_DPI, DEFAULT_MAX_PIXELS } from './render/renderPng.js';
export type { RenderPngOptions } from './render/renderPng.js';
export { renderPdf, svgSizePt } from './render/renderPdf.js';
export { measureText } from './render/svgWindow.js';
export { parseTheme, FONT_FAMILIES } from './render/theme.js';
export type { Theme, RoleStyle } from './render/theme.js';
export { loadTheme, sceneMetrics, themeTextStyle, THEMES, DEFAULT_THEME } from './render/themes.js';
export type { ThemeName } from './render/themes.js';
export { newmanFigure } from './api/figures/newman.js';
export type { NewmanFigure, NewmanFigureOptions } from './api/figures/newman.js';
export { writeFigure, figureFormat, figureBytes, FIGURE_FORMATS } from './api/figures/writeFigure.js';
export type { FigureFormat, WriteFigureOptions } from './api/figures/writeFigure.js';
// perceive (area B): bonds from coordinates, rings, selections
export { perceiveBonds, BOND_TOLERANCE_A, MIN_BOND_LENGTH_A } from './perceive/perceiveBonds.js';
export type { PerceiveBondsOptions } from './perceive/perceiveBonds.js';
export { withBonds } from './perceive/withBonds.js';
export { findRings, canonicalRing } from './perceive/findRings.js';
export { ringSystems } from './perceive/ringSystems.js';
export type { RingSystem } from './perceive/ringSystems.js';
export { atomIndex } from './perceive/atomIndex.js';
export { bondSelection, bondListSelection } from './perceive/bondSelection.js';
export { ringSelection } from './perceive/ringSelection.js';
export { selectAtom, selectRings, ringTokenKind, splitAtomList } from './perceive/atomSelection.js';
export type { RingTokenKind } from './perceive/atomSelection.js';
export { residuesOf, residueLabel, atomResidueLabel, residueKey } from './perceive/residues.js';
export type { Residue } from './perceive/residues.js';
export { isTrigonalAtom, isTrigonalRing, trigonalAtoms } from './perceive/trigonalAtoms.js';
// shared record preparation (integrator)
export { prepareRecord, readRecord } from './api/prepare.js';
export { FLAT_INPUT_WARNING, isTwoDimensional } from './api/flatInput.js';
export type { PreparedRecord, PrepareOptions } from './api/prepare.js';
export { DEFAULT_MAX_RING_SIZE, isCoordinationBond, ringClosingBonds, scopeRings } from './perceive/ringScope.js';
export type { RingScopeOptions, SetAsideRing, SetAsideReason } from './perceive/ringScope.js';
export { isMetal } from './model/elements.js';
export { METAL_TOLERANCE_A } from './perceive/perceiveBonds.js';
// inspect (integrator)
export { inspectFile, inspectMolecule } from './api/inspect/inspect.js';
export type { InspectOptions, InspectReport } from './api/inspect/inspect.js';
export { inspectText } from './api/inspect/inspectText.js';
export { jsonText } from './api/jsonText.js';
export { recordReport } from './analysis/recordReport.js';
export type { RecordReport, RecordReportOptions } from './analysis/recordReport.js';
// io (area A): readers, format detection, energies, XYZ writer
export { parseText, parseTextSettled } from './io/parseText.js';
export type { ParseTextOptions } from './io/parseText.js';
export { readRecords, readRecordsSettled } from './io/readRecords.js';
export type { StreamOptions } from './io/readRecords.js';
export { readFrames } from './io/readFrames.js';
export type { Frame, FrameOptions } from './io/readFrames.js';
export type { Settled } from './io/sink.js';
export type { ReadOptions } from './io/limits.js';
export { DEFAULT_LIMITS } from './io/limits.js';
export { detectFormat, formatFromExtension } from './io/detectFormat.js';
export { findEnergy, toKcalPerMol, normalizeEnergyUnit, energySpreadWarning, unitRequest, UNIT_SOURCE_WORDS } from './io/energy.js';
export type { Energy, EnergyOptions, EnergyUnitSource, FoundEnergy } from './io/energy.js';
export { formatXyz } from './io/formatXyz.js';
export type { FormatXyzOptions } from './io/formatXyz.js';
export { parseXyzComment } from './io/xyzComment.js';
// chair (area G): chair template and projected ring figures
export { ringViewFrame, projectPoint, shoelaceArea, checkElevation } from './layout/ring/ringView.js';
export type { RingViewFrame, ViewPoint } from './layout/ring/ringView.js';
export { toPlacementJson, DEFAULT_ELEVATION_DEG } from './layout/ring/ringPlacement.js';
export type { RingPlacement, PlacedBond, PlacementJson, RingView, RingHydrogens } from './layout/ring/ringPlacement.js';
export { chairTemplate, assertChair, ringName, TEMPLATE_BOND_FRACTION } from './layout/ring/chairTemplate.js';
export { chairOutline, type ChairOutlineKind } from './layout/ring/chairOutline.js';
export { ringHydrogenMode, type RingHydrogenMode } from './layout/ring/ringHydrogens.js';
export type { ChairTemplateOptions } from './layout/ring/chairTemplate.js';
export { ringProjection } from './layout/ring/ringProjection.js';
export type { RingProjectionOptions } from './layout/ring/ringProjection.js';
export { ringCaption, descriptorRuns, ringTitle, ringDescription } from './layout/ring/ringCaption.js';
export type { CaptionRun } from './layout/ring/ringCaption.js';
export { groupText } from './layout/ring/ringLabels.js';
export { groupLabel, isTerminalDouble } from './layout/text/groupLabel.js';
export type { GroupLabel, GroupContext } from './layout/text/groupLabel.js';
export { chemicalRingOrder } from './analysis/chemicalNumbering.js';
export type { RingLabels } from './layout/ring/ringLabels.js';
export { layoutRing } from './layout/ring/ringLayout.js';
export type { RingLayoutOptions } from './layout/ring/ringLayout.js';
export { chairFigure } from './api/figures/chair.js';
export type { ChairFigure, ChairFigureOptions } from './api/figures/chair.js';
// batch + ensemble (area H)
export { BOND_SETS, figureBonds, ringBonds } from './analysis/figureBonds.js';
export type { BondSet, FigureBondOptions } from './analysis/figureBonds.js';
export { layoutContactSheet, panelLetter } from './layout/sheets/contactSheet.js';
export type { SheetPanel, ContactSheetOptions, PanelPlacement } from './layout/sheets/contactSheet.js';
export { layoutEnergyLadder, percentText } from './layout/plots/energyLadder.js';
export type { LadderLevel, EnergyLadderOptions } from './layout/plots/energyLadder.js';
export { FIGURE_RENDERERS, canDraw, drawFigure } from './api/figures/figureKinds.js';
export type { FigureKind, FigureRenderer, FigureContext, FigureTarget, DrawnFigure } from './api/figures/figureKinds.js';
export { figureSvg } from './api/figures/figureSvg.js';
export type { FigureSvgOptions } from './api/figures/figureSvg.js';
export { contactSheet } from './api/figures/contactSheet.js';
export type { ContactPanel, ContactSheetSvgOptions } from './api/figures/contactSheet.js';
export { TABLE_FORMATS, TABLE_WRITERS, tableCsv, tableMarkdown, tableLatex, texEscape, fixed } from './api/tables/tableText.js';
export type { Table, TableCell, TableColumn, TableFormat } from './api/tables/tableText.js';
export { supportTables } from './api/tables/supportTables.js';
export { analyseRecord, recordLabel } from './api/recordAnalysis.js';
export type { RecordAnalysis, RecordAnalysisOptions } from './api/recordAnalysis.js';
export { recordOutcomes } from './api/recordStream.js';
export type { RecordError, RecordOutcome } from './api/recordStream.js';
export { batchFile } from './api/batch/batch.js';
export type { BatchOptions, BatchResult, BatchManifest, ManifestFigure } from './api/batch/batch.js';
export { ensembleFile, ensembleOf, isFreeEnergyField } from './api/ensemble/ensemble.js';
export type { EnsembleOptions, EnsembleResult, EnsembleReport, EnsembleConformer } from './api/ensemble/ensemble.js';
export { ensembleText } from './api/ensemble/ensembleText.js';
export { writeEnsembleFigures } from './api/ensemble/ensembleFigures.js';
export type { EnsembleFigureOptions } from './api/ensemble/ensembleFigures.js';
// trajectory (area I)
export { analyzeTrajectory } from './api/trajectory/trajectory.js';
export type { TrajectoryOptions, TrajectorySummary } from './api/trajectory/trajectory.js';
export { parseTimestep, TIME_UNITS } from './api/trajectory/timestep.js';
export type { Timestep, TimeUnit } from './api/trajectory/timestep.js';
export { TrajectoryStats } from './analysis/trajectoryStats.js';
export type { ShapeStatistics, DwellStats, TrajectoryStatsOptions } from './analysis/trajectoryStats.js';
export { PuckerKernel, PuckerValues } from './geometry/puckerKernel.js';
export { torsionAt } from './geometry/torsionAt.js';
export { ShapeTable, PLANAR_FORM, PUCKERED_FORM } from './analysis/shapeTable.js';
export { PolarGrid } from './analysis/polarGrid.js';
export type { PolarCell } from './analysis/polarGrid.js';
export { SeriesBuckets } from './analysis/seriesBuckets.js';
export type { SeriesBucket } from './analysis/seriesBuckets.js';
export { layoutPuckerMap, equalAreaRadius } from './layout/plots/puckerMapLayout.js';
export type { PuckerMapOptions } from './layout/plots/puckerMapLayout.js';
export { layoutPseudorotationWheel } from './layout/plots/pseudorotationWheelLayout.js';
export { layoutTimeSeries } from './layout/plots/timeSeriesLayout.js';
export type { SeriesSpec, TimeSeriesOptions } from './layout/plots/timeSeriesLayout.js';
export { layoutOccupancy } from './layout/plots/occupancyLayout.js';
export type { OccupancyOptions } from './layout/plots/occupancyLayout.js';
export { withTrajectoryRoles, SHAPE_ORDER } from './api/trajectory/trajectoryTheme.js';
// demo (integrator)
export { renderDemo, DEMO_INPUTS } from './api/demo/demo.js';
export type { DemoOptions, DemoResult } from './api/demo/demo.js';
export { galleryPage } from './api/demo/galleryPage.js';
export type { GalleryFigure, GalleryLink, GallerySection } from './api/demo/galleryPage.js';

// explore: the self-contained explorer page
export { exploreFile } from './api/explore/exploreFile.js';
export type { ExploreOptions, ExploreResult } from './api/explore/exploreFile.js';
export { exploreModel, EXPLORE_MAX_BYTES } from './api/explore/exploreModel.js';
export type { ExploreModel, ExploreModelOptions, ExploreRow } from './api/explore/exploreModel.js';
export { exploreRecord } from './api/explore/exploreRecord.js';
export type { ExploreBond, ExploreRing, ExploreTorsion, ExploreFigure, ExploreFigureOptions, ExploreRecordDetail, ExploreRecordOptions } from './api/explore/exploreRecord.js';
export { explorePage } from './api/explore/explorePage.js';
export type { ExplorePageOptions } from './api/explore/explorePage.js';
export { figureCommand, shellWord } from './api/explore/exploreCommand.js';
export type { FigureCommand } from './api/explore/exploreCommand.js';

// area J (robustness): file-system reasons in words
export { fsReason, isSystemError } from './io/fsReason.js';
export { safeText, sceneTextWarnings, MAX_LABEL_LENGTH, type SafeText } from './layout/text/safeText.js';
export { heldRecords, holdCounter, resolveHoldLimits, DEFAULT_HOLD_LIMITS, type HoldOptions, type HoldLimits } from './api/holdLimits.js';
