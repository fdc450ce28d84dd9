export { parseCutList, CUT_LIST_COLUMNS, type CutListItem } from './parse-cut-list';
export { parseOffcutRack, OFFCUT_RACK_COLUMNS, type OffcutRackItem } from './parse-offcut-rack';
export { CUT_LIST_TEMPLATE_CSV, OFFCUT_RACK_TEMPLATE_CSV } from './cut-list-template';
export { buildYardCutListTemplate } from './yard-template';
export { MAX_QUANTITY } from './field-readers';
export { MAX_ROWS } from './import-rows';
export type { ImportError, ImportOptions, ImportResult, SectionRef } from './import-types';
