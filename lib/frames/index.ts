export { FRAME_STRUCTURE_NOTICE } from './notice';
export * from './panel-schemas';
export {
  framePreviewBodySchema,
  frameUnitSchema,
  type FramePreviewBody,
  type FramePreviewBodyInput,
} from './frame-preview-body-schema';
export { findGeometryIssues, type GeometryIssue } from './find-geometry-issues';
export {
  validateFrameSchedule,
  type FrameValidationError,
  type FrameValidationResult,
} from './validate-frame-schedule';
export { generateFrameItems } from './generate-frame-items';
export { layoutPanel, type PanelLayout, type LayoutShape, type LayoutDimension } from './layout-panel';
export { sumItemsBySection, type FrameLineItem } from './sum-items-by-section';
export { getMemberCentres } from './stud-layout';
export { getRoofGeometry, type RoofGeometry } from './roof-frame';
export { getDoorLeafGeometry, type DoorBrace, type DoorLeafGeometry } from './door-leaf';
export { getCourseBands, getJointPositions } from './cladding';
export { getFramedWall, type FramedWall } from './fit-between';
export { getWallHeightAt } from './wall-height';
export type {
  FrameContext,
  FrameItem,
  FrameItemsResult,
  FramePiece,
  Point,
  SectionDimensions,
} from './types';
