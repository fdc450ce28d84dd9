// The usual cautions at a cut-to-length saw (cross-cut, pull-over or docking saw), each with the
// published guidance behind it, or marked common practice. The yard's own risk assessment comes first.
export type Caution = { text: string; source: string };

export const SAW_CAUTIONS: Caution[] = [
  {
    text: 'Let the blade return to rest behind the fence and stop before a hand goes near it.',
    source: 'HSE WIS36, Safe use of manually operated cross-cut sawing machines',
  },
  {
    text: 'Hands out of the marked no-go zone either side of the blade line.',
    source: 'HSE woodworking guidance, cross-cut saws (300 mm either side)',
  },
  {
    text: 'Support long lengths on roller stands or the infeed and outfeed tables.',
    source: 'common practice, no published source',
  },
  {
    text: 'Hold short pieces with a clamp or against a length stop, never by hand near the blade.',
    source: 'common practice, no published source',
  },
  {
    text: 'Two people to lift and carry 5–6 m lengths.',
    source: 'common practice; HSE INDG143, Manual handling at work',
  },
  {
    text: 'Eye and hearing protection on.',
    source: 'Control of Noise at Work Regulations 2005',
  },
  {
    text: 'Dust extraction running before you start.',
    source: 'HSE WIS23, wood dust',
  },
];

export const TREATED_CAUTIONS: Caution[] = [
  {
    text: 'Dust mask and gloves when cutting; wash before eating.',
    source: 'USDA Wood Handbook FPL-GTR-190, ch. 15',
  },
  {
    text: 'Brush end-grain preservative onto every cut end before the piece leaves the saw.',
    source: 'common practice, no published source',
  },
  {
    text: 'Scrap goes in the separate treated-waste skip: never burnt, never used for animal bedding, mulch or compost.',
    source: 'USDA Wood Handbook FPL-GTR-190, ch. 15 (never burn); the rest common practice',
  },
];

export const RISK_ASSESSMENT_NOTE =
  "Your yard's own risk assessment, safe-working rules and training come first; these are reminders, not a substitute.";
