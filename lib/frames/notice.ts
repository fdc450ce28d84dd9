/** Shown with every frame result: the schedule counts and cuts timber; it never sizes structure. */
export const FRAME_STRUCTURE_NOTICE =
  'This frame schedule counts and cuts timber; it does not size structure. Stud sizes and spacing, ' +
  'spans, headers, fixings and foundations follow local building rules (for example UK Approved ' +
  'Document A or IRC R602 in the US) or an engineer.';
