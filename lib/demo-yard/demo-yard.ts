// The demo yard: an invented timber merchant, its products, rack and customers.
// None of these figures is a reference value; they only make the demo look like a working yard.
import type { Role } from '@/db/schema';

export const DEMO_PASSWORD = 'kerfwise';

export const demoUsers: { email: string; name: string; role: Role }[] = [
  { email: 'owner@yard.test', name: 'Maggie Rowntree', role: 'owner' },
  { email: 'hand@yard.test', name: 'Tom Ellery', role: 'yard_hand' },
  { email: 'saw@yard.test', name: 'Dev Okafor', role: 'saw_operator' },
];

export const demoYardName = 'Brackenridge Timber & Saw';

type DemoSection = {
  code: string;
  name: string;
  thicknessMm: number;
  widthMm: number;
  species: string;
  grade: string;
  treatment: string;
  finish: 'sawn' | 'planed';
  pencePerMetre: number;
  lengthsMm: number[];
  unlimited?: boolean;
};

const UK_LENGTHS = [2400, 3000, 3600, 4200, 4800, 5400];

export const demoSections: DemoSection[] = [
  {
    code: 'T47100',
    name: '47×100 C24 treated',
    thicknessMm: 47,
    widthMm: 100,
    species: 'European redwood',
    grade: 'C24',
    treatment: 'Treated UC3',
    finish: 'sawn',
    pencePerMetre: 265,
    lengthsMm: [...UK_LENGTHS, 6000],
  },
  {
    code: 'T47150',
    name: '47×150 C24 treated',
    thicknessMm: 47,
    widthMm: 150,
    species: 'European redwood',
    grade: 'C24',
    treatment: 'Treated UC3',
    finish: 'sawn',
    pencePerMetre: 395,
    lengthsMm: [...UK_LENGTHS, 6000],
  },
  {
    code: 'T47075',
    name: '47×75 C16 treated',
    thicknessMm: 47,
    widthMm: 75,
    species: 'European whitewood',
    grade: 'C16',
    treatment: 'Treated UC3',
    finish: 'sawn',
    pencePerMetre: 185,
    lengthsMm: UK_LENGTHS,
  },
  {
    code: 'CLS3863',
    name: '38×63 CLS',
    thicknessMm: 38,
    widthMm: 63,
    species: 'Spruce',
    grade: 'C16',
    treatment: 'Kiln dried',
    finish: 'planed',
    pencePerMetre: 120,
    lengthsMm: [2400, 3000, 3600, 4800],
    unlimited: true,
  },
  {
    code: 'CLS3889',
    name: '38×89 CLS',
    thicknessMm: 38,
    widthMm: 89,
    species: 'Spruce',
    grade: 'C16',
    treatment: 'Kiln dried',
    finish: 'planed',
    pencePerMetre: 165,
    lengthsMm: [2400, 3000, 3600, 4800],
    unlimited: true,
  },
  {
    code: 'B25038',
    name: '25×38 treated batten',
    thicknessMm: 25,
    widthMm: 38,
    species: 'European whitewood',
    grade: 'Batten',
    treatment: 'Treated UC3',
    finish: 'sawn',
    pencePerMetre: 55,
    lengthsMm: [3000, 3600, 4800],
  },
  {
    code: 'P18094',
    name: '18×94 planed whitewood',
    thicknessMm: 18,
    widthMm: 94,
    species: 'European whitewood',
    grade: 'Joinery',
    treatment: 'Untreated',
    finish: 'planed',
    pencePerMetre: 140,
    lengthsMm: [2400, 3000, 3600, 4200],
  },
  {
    code: 'SHP19125',
    name: '19×125 shiplap cladding',
    thicknessMm: 19,
    widthMm: 125,
    species: 'European redwood',
    grade: 'Cladding',
    treatment: 'Treated UC3',
    finish: 'planed',
    pencePerMetre: 210,
    lengthsMm: [3000, 3600, 4200, 4800],
  },
  {
    code: 'TG19125',
    name: '19×125 tongue & groove cladding',
    thicknessMm: 19,
    widthMm: 125,
    species: 'European redwood',
    grade: 'Cladding',
    treatment: 'Treated UC3',
    finish: 'planed',
    pencePerMetre: 225,
    lengthsMm: [3000, 3600, 4200, 4800],
  },
  {
    code: 'T75100',
    name: '75×100 C24 treated',
    thicknessMm: 75,
    widthMm: 100,
    species: 'European redwood',
    grade: 'C24',
    treatment: 'Treated UC4',
    finish: 'sawn',
    pencePerMetre: 610,
    lengthsMm: [2400, 3000, 3600, 4800],
  },
];

export const rackLocations = [
  'Rack A1',
  'Rack A2',
  'Rack A3',
  'Rack B1',
  'Rack B2',
  'Rack B3',
  'Rack C1',
  'Short bin',
];

export const demoJobs = [
  {
    reference: 'J-1001',
    customerName: 'Priya Halloran',
    customerEmail: 'priya.halloran@example.com',
    dueInDays: 4,
    status: 'draft' as const,
    notes: 'Garden shed walls, collects Saturday.',
  },
  {
    reference: 'J-1002',
    customerName: 'Fenwick Joinery',
    customerEmail: 'orders@fenwick-joinery.example.com',
    dueInDays: 2,
    status: 'draft' as const,
    notes: 'Stud partition for a loft conversion.',
  },
  {
    reference: 'J-1003',
    customerName: 'Ade Thornbury',
    customerEmail: 'ade.t@example.com',
    dueInDays: 7,
    status: 'draft' as const,
    notes: 'Raised beds and a compost bay.',
  },
  {
    reference: 'J-1004',
    customerName: 'Cobb Lane Allotments',
    customerEmail: 'secretary@cobblane.example.org',
    dueInDays: -10,
    status: 'cancelled' as const,
    notes: 'Cancelled by phone: order moved to spring.',
  },
];

/** Line items per job reference: [section code, length mm, quantity, label]. */
export const demoJobItems: Record<string, [string, number, number, string][]> = {
  'J-1001': [
    ['T47075', 1830, 14, 'wall stud'],
    ['T47075', 2400, 4, 'top plate'],
    ['T47075', 1800, 4, 'bottom plate'],
    ['T47075', 560, 12, 'noggin'],
    ['SHP19125', 2400, 30, 'cladding'],
  ],
  'J-1002': [
    ['CLS3889', 2350, 11, 'stud'],
    ['CLS3889', 3600, 2, 'head plate'],
    ['CLS3889', 3600, 1, 'sole plate'],
    ['CLS3889', 555, 10, 'noggin'],
  ],
  'J-1003': [
    ['T47150', 1800, 8, 'bed side'],
    ['T47150', 1200, 8, 'bed end'],
    ['T75100', 450, 8, 'corner post'],
    ['T47100', 1000, 6, 'compost bay rail'],
  ],
  'J-1004': [['T47100', 2100, 10, 'fence rail']],
};

/** A small deterministic generator so the demo yard is the same on every machine. */
export function seededRandom(seed: number): () => number {
  let state = seed >>> 0;
  return () => {
    state = (Math.imul(state, 1664525) + 1013904223) >>> 0;
    return state / 2 ** 32;
  };
}
