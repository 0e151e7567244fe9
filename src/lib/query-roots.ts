/**
 * The first segment of every feature's query keys. A change that moves a whole stand's advice
 * (its guideline, its sunny side) refreshes every feature by these prefixes, without one feature
 * importing another's key factory.
 */
export const queryRoots = {
  sugarbushes: ['sugarbushes'],
  /** A tree's advice nests under its detail key, so this prefix covers the advice too. */
  trees: ['trees'],
  plans: ['plans'],
  map: ['map'],
  /** The measuring round's trees. */
  round: ['round'],
  /** Notes, their photos and the needs-a-look queue. */
  notes: ['notes'],
  /** A tree's readings and its holes, which field entries add to. */
  measurements: ['measurements'],
  tapholes: ['tapholes'],
  /** A stand's weather, sap and syrup by day. */
  seasonLog: ['season-log'],
} as const;
