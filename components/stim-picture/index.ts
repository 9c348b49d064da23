export { StimPicture } from "./stim-picture";
export { CycleRibbon, type CycleRibbonProps } from "./cycle-ribbon";
export { PulseShape, type PulseShapeProps } from "./pulse-shape";
export { FindingsList, findingsSummary } from "./findings-list";
export { DerivedFigures } from "./derived-figures";
