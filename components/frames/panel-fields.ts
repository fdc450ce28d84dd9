import type { FrameSchedulePanel } from '@/lib/frames';

export type PanelKind = FrameSchedulePanel['kind'];

/** One form field of a panel: how it is typed in and turned into the panel's value. */
export type FieldSpec = {
  key: string;
  label: string;
  type: 'length' | 'number' | 'section' | 'panel' | 'choice' | 'yesno' | 'text';
  optional?: boolean;
  hint?: string;
  /** For 'panel': which kinds of panel may be chosen. */
  of?: PanelKind[];
  /** For 'choice': value and label. */
  options?: [string, string][];
};

export const KIND_NAMES: Record<PanelKind, string> = {
  wall: 'Wall',
  sloped_wall: 'Sloped wall',
  opening: 'Door or window opening',
  roof: 'Roof',
  base: 'Base',
  door_leaf: 'Door leaf',
  cladding: 'Cladding',
  free: 'Loose pieces',
};

export const KIND_HINTS: Record<PanelKind, string> = {
  wall: 'Straight stud wall: plates, studs at centres, noggins.',
  sloped_wall: 'Mono-pitch side wall rising from a low to a high side.',
  opening: 'A door or window in a wall: trimmers, head, cripples, sill.',
  roof: 'Mono-pitch roof: rafters at centres along the walls.',
  base: 'Floor frame: joists on bearers.',
  door_leaf: 'Ledged and braced door for an opening.',
  cladding: 'Boards to cover a wall, courses and joints.',
  free: 'Any other pieces, typed in as they are.',
};

const section: FieldSpec = { key: 'sectionId', label: 'Section', type: 'section' };
const studFraming: FieldSpec[] = [
  { key: 'centres', label: 'Stud centres', type: 'length', hint: 'e.g. 400, 600 or 16"' },
  { key: 'bottomPlate', label: 'Bottom plate', type: 'yesno' },
  {
    key: 'topPlate',
    label: 'Top plate',
    type: 'choice',
    options: [
      // Left empty, the region decides: a single head plate in the UK, a double top plate in North America.
      ['', "The region's habit"],
      ['double', 'Double'],
      ['single', 'Single'],
    ],
  },
  { key: 'nogginRows', label: 'Noggin rows', type: 'number' },
  {
    key: 'startWallId',
    label: 'Start fits against',
    type: 'panel',
    of: ['wall', 'sloped_wall'],
    optional: true,
    hint: 'The wall this one fits inside at its start corner: framing shortened by that wall’s depth',
  },
  {
    key: 'endWallId',
    label: 'End fits against',
    type: 'panel',
    of: ['wall', 'sloped_wall'],
    optional: true,
    hint: 'The same at the far corner; blank where this wall runs past it',
  },
];

export const PANEL_FIELDS: Record<PanelKind, FieldSpec[]> = {
  wall: [
    section,
    { key: 'length', label: 'Length', type: 'length' },
    { key: 'height', label: 'Height', type: 'length' },
    ...studFraming,
  ],
  sloped_wall: [
    section,
    { key: 'length', label: 'Length', type: 'length' },
    { key: 'lowHeight', label: 'Low side height', type: 'length' },
    { key: 'highHeight', label: 'High side height', type: 'length' },
    ...studFraming,
  ],
  opening: [
    { key: 'wallId', label: 'In wall', type: 'panel', of: ['wall', 'sloped_wall'] },
    { key: 'position', label: 'From wall start', type: 'length', hint: 'To the opening’s left edge' },
    { key: 'width', label: 'Width', type: 'length' },
    { key: 'height', label: 'Height', type: 'length' },
    {
      key: 'sillHeight',
      label: 'Sill height',
      type: 'length',
      optional: true,
      hint: '0 or blank for a door',
    },
    {
      key: 'sectionId',
      label: 'Trimmer section',
      type: 'section',
      optional: true,
      hint: 'Blank: the wall’s section',
    },
    {
      key: 'headSectionId',
      label: 'Head section',
      type: 'section',
      optional: true,
      hint: 'Blank: the trimmer section',
    },
  ],
  roof: [
    { ...section, label: 'Rafter section' },
    { key: 'span', label: 'Span (front to back)', type: 'length' },
    { key: 'rise', label: 'Rise', type: 'length', optional: true, hint: 'Give a rise or a pitch' },
    { key: 'pitch', label: 'Pitch (degrees)', type: 'number', optional: true },
    { key: 'length', label: 'Length along the walls', type: 'length' },
    { key: 'centres', label: 'Rafter centres', type: 'length' },
    { key: 'eavesOverhang', label: 'Eaves overhang', type: 'length', optional: true },
    { key: 'backOverhang', label: 'Back overhang', type: 'length', optional: true },
    { key: 'sideOverhang', label: 'Side overhang', type: 'length', optional: true },
    { key: 'fasciaSectionId', label: 'Fascia section', type: 'section', optional: true },
  ],
  base: [
    { ...section, label: 'Joist section' },
    {
      key: 'bearerSectionId',
      label: 'Bearer section',
      type: 'section',
      optional: true,
      hint: 'Blank: the joist section',
    },
    { key: 'length', label: 'Length', type: 'length' },
    { key: 'width', label: 'Width', type: 'length' },
    { key: 'joistCentres', label: 'Joist centres', type: 'length' },
    { key: 'bearerCentres', label: 'Bearer centres', type: 'length' },
  ],
  door_leaf: [
    {
      key: 'openingId',
      label: 'For opening',
      type: 'panel',
      of: ['opening'],
      optional: true,
      hint: 'Or give the opening size below',
    },
    { key: 'openingWidth', label: 'Opening width', type: 'length', optional: true },
    { key: 'openingHeight', label: 'Opening height', type: 'length', optional: true },
    { ...section, label: 'Ledge and brace section' },
    { key: 'boardSectionId', label: 'Board section', type: 'section' },
    { key: 'boardCover', label: 'Board cover width', type: 'length', hint: 'Width each board covers' },
    { key: 'ledges', label: 'Ledges', type: 'number', optional: true },
    {
      key: 'hingeSide',
      label: 'Hinge side',
      type: 'choice',
      options: [
        ['left', 'Left'],
        ['right', 'Right'],
      ],
    },
    { key: 'clearanceWidth', label: 'Width clearance', type: 'length', optional: true, hint: 'Blank: 15' },
    { key: 'clearanceHeight', label: 'Height clearance', type: 'length', optional: true, hint: 'Blank: 10' },
  ],
  cladding: [
    {
      key: 'wallId',
      label: 'On wall',
      type: 'panel',
      of: ['wall', 'sloped_wall'],
      optional: true,
      hint: 'Or give width and height',
    },
    { key: 'width', label: 'Width to clad', type: 'length', optional: true },
    { key: 'height', label: 'Height to clad', type: 'length', optional: true },
    { ...section, label: 'Board section' },
    { key: 'cover', label: 'Board cover width', type: 'length' },
    {
      key: 'direction',
      label: 'Boards run',
      type: 'choice',
      options: [
        ['horizontal', 'Horizontal'],
        ['vertical', 'Vertical'],
      ],
    },
    { key: 'maxStockLength', label: 'Longest board', type: 'length', optional: true, hint: 'Blank: 4800' },
    { key: 'wastePercent', label: 'Waste allowance %', type: 'number', optional: true, hint: 'Blank: 10' },
  ],
  free: [
    { key: 'label', label: 'Piece label', type: 'text' },
    section,
    { key: 'length', label: 'Length', type: 'length' },
    { key: 'quantity', label: 'Quantity', type: 'number' },
    { key: 'angle', label: 'Cut angle (degrees)', type: 'number', optional: true },
  ],
};

/** Starting values in millimetres for a new panel, so it previews at once. */
export const NEW_PANEL_VALUES: Record<PanelKind, Record<string, number | string | boolean>> = {
  wall: { length: 2400, height: 2100, centres: 400, bottomPlate: true, topPlate: '', nogginRows: 1 },
  sloped_wall: {
    length: 1800,
    lowHeight: 1900,
    highHeight: 2200,
    centres: 400,
    bottomPlate: true,
    topPlate: '',
    nogginRows: 1,
  },
  opening: { position: 300, width: 760, height: 1800 },
  roof: { span: 1800, rise: 300, length: 2400, centres: 400, eavesOverhang: 150 },
  base: { length: 2400, width: 1800, joistCentres: 400, bearerCentres: 600 },
  door_leaf: { boardCover: 110, ledges: 3, hingeSide: 'left' },
  cladding: { cover: 110, direction: 'horizontal' },
  free: { label: 'corner brace', length: 600, quantity: 4 },
};
