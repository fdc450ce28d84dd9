// Invented past jobs for the demo yard's history: kinds of work with their cut lists.
// None of these figures is a reference value; they only give the reports something to show.

type Line = { code: string; lengths: number[]; min: number; max: number; label: string };

export const pastJobKinds: { notes: string; lines: Line[] }[] = [
  {
    notes: 'Garden shed walls.',
    lines: [
      { code: 'T47075', lengths: [1830, 1900, 1750], min: 10, max: 16, label: 'wall stud' },
      { code: 'T47075', lengths: [2400, 2100], min: 4, max: 6, label: 'plate' },
      { code: 'T47075', lengths: [560, 565], min: 8, max: 12, label: 'noggin' },
      { code: 'SHP19125', lengths: [2400, 2100, 1800], min: 18, max: 30, label: 'cladding' },
    ],
  },
  {
    notes: 'Deck frame.',
    lines: [
      { code: 'T47150', lengths: [3600, 3300, 2900], min: 6, max: 10, label: 'joist' },
      { code: 'T47150', lengths: [2400, 2700], min: 2, max: 4, label: 'rim joist' },
      { code: 'T75100', lengths: [600, 750], min: 4, max: 8, label: 'post' },
    ],
  },
  {
    notes: 'Close-boarded fence run.',
    lines: [
      { code: 'T47100', lengths: [1800, 2400, 1500], min: 8, max: 16, label: 'rail' },
      { code: 'T75100', lengths: [1800, 2100], min: 4, max: 8, label: 'post' },
    ],
  },
  {
    notes: 'Raised beds.',
    lines: [
      { code: 'T47150', lengths: [1800, 1500, 1200], min: 4, max: 8, label: 'bed side' },
      { code: 'T47150', lengths: [900, 1000, 600], min: 4, max: 8, label: 'bed end' },
      { code: 'T75100', lengths: [450, 400], min: 4, max: 8, label: 'corner post' },
    ],
  },
  {
    notes: 'Stud partition.',
    lines: [
      { code: 'CLS3889', lengths: [2350, 2400, 2250], min: 8, max: 14, label: 'stud' },
      { code: 'CLS3889', lengths: [3600, 3000], min: 2, max: 3, label: 'plate' },
      { code: 'CLS3889', lengths: [555, 450], min: 8, max: 12, label: 'noggin' },
    ],
  },
  {
    notes: 'Workshop lining battens and shelving.',
    lines: [
      { code: 'B25038', lengths: [1200, 1800, 900], min: 10, max: 20, label: 'batten' },
      { code: 'P18094', lengths: [900, 1200, 750], min: 6, max: 10, label: 'shelf' },
    ],
  },
  {
    notes: 'Gable cladding.',
    lines: [
      { code: 'TG19125', lengths: [2100, 1500, 2700], min: 12, max: 24, label: 'cladding board' },
      { code: 'B25038', lengths: [2400, 1800], min: 6, max: 10, label: 'counter batten' },
    ],
  },
  // Small counter jobs, the everyday trade of a yard: a few lengths cut while the customer waits.
  {
    notes: 'Fence repair: a couple of rails and a post.',
    lines: [
      { code: 'T47100', lengths: [1830, 2400], min: 2, max: 4, label: 'rail' },
      { code: 'T75100', lengths: [1800, 2400], min: 1, max: 2, label: 'post' },
    ],
  },
  {
    notes: 'Shed floor bearers.',
    lines: [{ code: 'T47075', lengths: [1800, 2400, 1200], min: 3, max: 6, label: 'bearer' }],
  },
  {
    notes: 'Window boards and trims.',
    lines: [{ code: 'P18094', lengths: [1200, 900, 1050], min: 2, max: 5, label: 'window board' }],
  },
  {
    notes: 'Log store frame.',
    lines: [
      { code: 'T47075', lengths: [1200, 1500], min: 4, max: 6, label: 'upright' },
      { code: 'B25038', lengths: [1000, 900], min: 6, max: 10, label: 'slat' },
    ],
  },
];

export const pastCustomers = [
  'Harlow & Finch Builders',
  'Nadia Brennock',
  'Otterbrook Primary PTA',
  'G. Stannard',
  'Wexcombe Property Care',
  'Imogen Treadwell',
  'Lark Rise Garden Co.',
  'Callum Ashdown',
  'Riverside Community Allotment',
  'Petra Colebrook',
  'Holloway Loft Conversions',
  'Dominic Fairbairn',
  'Brackenfield Joinery',
  'Sunita Okafor',
  'Meadowcroft Lettings',
  'Tomasz Wierzbicki',
  'Ashgrove Garden Services',
  'Frances Linnell',
];
