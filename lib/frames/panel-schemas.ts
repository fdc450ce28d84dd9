import { z } from 'zod';

// Every length is whole millimetres; the schedule's `unit` only changes how lengths are shown.
const mm = (what: string, min = 1, max = 30_000) =>
  z
    .number({ error: `${what} must be a number of millimetres` })
    .int({ error: `${what} must be whole millimetres` })
    .min(min, { error: `${what} must be at least ${min} mm` })
    .max(max, { error: `${what} must be at most ${max} mm` });

const count = (what: string, min: number, max: number) =>
  z
    .number({ error: `${what} must be a number` })
    .int({ error: `${what} must be a whole number` })
    .min(min, { error: `${what} must be at least ${min}` })
    .max(max, { error: `${what} must be at most ${max}` });

const sectionIdSchema = (what = 'Section') =>
  z
    .number({ error: `${what} must be chosen` })
    .int({ error: `${what} id must be a whole number` })
    .positive({ error: `${what} id must be positive` })
    .max(2_147_483_647, { error: `${what} id is too large` });

const panelBase = {
  id: z.string().trim().min(1, { error: 'Panel id must not be empty' }).max(40).optional(),
  name: z
    .string({ error: 'Give the panel a name, e.g. "back wall"' })
    .trim()
    .min(1, { error: 'Give the panel a name, e.g. "back wall"' })
    .max(60, { error: 'Panel name must be at most 60 characters' }),
};

const studFraming = {
  centres: mm('Stud centres', 100, 1200),
  bottomPlate: z.boolean({ error: 'Bottom plate must be yes or no' }).default(true),
  // Left out: the region's habit, a single head plate in the UK and a double top plate in North America.
  topPlate: z.enum(['single', 'double'], { error: 'Top plate must be single or double' }).optional(),
  nogginRows: count('Noggin rows', 0, 5).default(0),
  // At a corner the wall may fit between its neighbours: its framing is shortened by their depth.
  startWallId: z.string().min(1).max(40).optional(),
  endWallId: z.string().min(1).max(40).optional(),
};

export const wallPanelSchema = z.object({
  kind: z.literal('wall'),
  ...panelBase,
  sectionId: sectionIdSchema(),
  length: mm('Wall length'),
  height: mm('Wall height', 100, 10_000),
  ...studFraming,
});

export const slopedWallPanelSchema = z.object({
  kind: z.literal('sloped_wall'),
  ...panelBase,
  sectionId: sectionIdSchema(),
  length: mm('Wall length'),
  lowHeight: mm('Low side height', 100, 10_000),
  highHeight: mm('High side height', 100, 10_000),
  ...studFraming,
});

export const openingPanelSchema = z.object({
  kind: z.literal('opening'),
  ...panelBase,
  wallId: z
    .string({ error: 'Choose the wall this opening is in' })
    .min(1, { error: 'Choose the wall this opening is in' }),
  /** Trimmers, cripples and sill; the wall's section when absent. */
  sectionId: sectionIdSchema().optional(),
  /** Head piece, laid on edge; the opening's section when absent. */
  headSectionId: sectionIdSchema('Head section').optional(),
  position: mm('Opening position', 0),
  width: mm('Opening width', 100, 10_000),
  height: mm('Opening height', 100, 10_000),
  sillHeight: mm('Sill height', 0, 10_000).default(0),
});

export const roofPanelSchema = z.object({
  kind: z.literal('roof'),
  ...panelBase,
  sectionId: sectionIdSchema('Rafter section'),
  /** Horizontal run of the rafters, front wall to back wall. */
  span: mm('Roof span'),
  pitch: z
    .number({ error: 'Pitch must be a number of degrees' })
    .gt(0, { error: 'Pitch must be more than 0°' })
    .max(75, { error: 'Pitch must be at most 75°' })
    .optional(),
  rise: mm('Roof rise', 1).optional(),
  centres: mm('Rafter centres', 100, 1200),
  /** Along the walls: the width across which rafters are spaced. */
  length: mm('Roof length'),
  eavesOverhang: mm('Eaves overhang', 0, 1500).default(0),
  backOverhang: mm('Back overhang', 0, 1500).default(0),
  sideOverhang: mm('Side overhang', 0, 1500).default(0),
  fasciaSectionId: sectionIdSchema('Fascia section').optional(),
});

export const basePanelSchema = z.object({
  kind: z.literal('base'),
  ...panelBase,
  sectionId: sectionIdSchema('Joist section'),
  bearerSectionId: sectionIdSchema('Bearer section').optional(),
  length: mm('Base length'),
  width: mm('Base width'),
  joistCentres: mm('Joist centres', 100, 1200),
  bearerCentres: mm('Bearer centres', 100, 3000),
});

export const doorLeafPanelSchema = z.object({
  kind: z.literal('door_leaf'),
  ...panelBase,
  /** Ledges and braces. */
  sectionId: sectionIdSchema('Ledge section'),
  boardSectionId: sectionIdSchema('Board section'),
  /** An opening panel's id; or give openingWidth and openingHeight. */
  openingId: z.string().min(1).optional(),
  openingWidth: mm('Opening width', 100, 10_000).optional(),
  openingHeight: mm('Opening height', 100, 10_000).optional(),
  clearanceWidth: mm('Width clearance', 0, 200).default(15),
  clearanceHeight: mm('Height clearance', 0, 200).default(10),
  ledges: count('Ledges', 2, 6).default(3),
  /** From the leaf's top and bottom edges to the outer ledges. */
  ledgeInset: mm('Ledge inset', 0, 1000).default(150),
  /** From the leaf's side edges to the brace ends. */
  braceInset: mm('Brace inset', 0, 500).default(50),
  hingeSide: z.enum(['left', 'right'], { error: 'Hinge side must be left or right' }).default('left'),
  boardCover: mm('Board cover width', 20, 400),
});

export const claddingPanelSchema = z.object({
  kind: z.literal('cladding'),
  ...panelBase,
  sectionId: sectionIdSchema('Board section'),
  /** A wall or sloped wall panel's id; or give width and height. */
  wallId: z.string().min(1).optional(),
  width: mm('Cladding width').optional(),
  height: mm('Cladding height', 1, 10_000).optional(),
  cover: mm('Board cover width', 20, 400),
  direction: z
    .enum(['horizontal', 'vertical'], { error: 'Boards run horizontal or vertical' })
    .default('horizontal'),
  maxStockLength: mm('Longest stock length', 600, 12_000).default(4800),
  wastePercent: z
    .number({ error: 'Waste allowance must be a percentage' })
    .min(0, { error: 'Waste allowance must be 0 % or more' })
    .max(100, { error: 'Waste allowance must be at most 100 %' })
    .default(10),
});

export const freePanelSchema = z.object({
  kind: z.literal('free'),
  ...panelBase,
  sectionId: sectionIdSchema(),
  label: z.string().trim().min(1, { error: 'Give the piece a label' }).max(60),
  length: mm('Length'),
  quantity: count('Quantity', 1, 10_000),
  angle: z
    .number({ error: 'Angle must be a number of degrees' })
    .min(0, { error: 'Angle must be 0° or more' })
    .lt(90, { error: 'Angle must be less than 90°' })
    .optional(),
});

export const frameSchedulePanelSchema = z.discriminatedUnion(
  'kind',
  [
    wallPanelSchema,
    slopedWallPanelSchema,
    openingPanelSchema,
    roofPanelSchema,
    basePanelSchema,
    doorLeafPanelSchema,
    claddingPanelSchema,
    freePanelSchema,
  ],
  { error: 'Panel kind must be wall, sloped_wall, opening, roof, base, door_leaf, cladding or free' },
);

export type FrameSchedulePanelInput = z.input<typeof frameSchedulePanelSchema>;
export type FrameSchedulePanel = z.output<typeof frameSchedulePanelSchema>;
export type WallPanel = z.output<typeof wallPanelSchema>;
export type SlopedWallPanel = z.output<typeof slopedWallPanelSchema>;
export type OpeningPanel = z.output<typeof openingPanelSchema>;
export type RoofPanel = z.output<typeof roofPanelSchema>;
export type BasePanel = z.output<typeof basePanelSchema>;
export type DoorLeafPanel = z.output<typeof doorLeafPanelSchema>;
export type CladdingPanel = z.output<typeof claddingPanelSchema>;
export type FreePanel = z.output<typeof freePanelSchema>;
export type StudWallPanel = WallPanel | SlopedWallPanel;
