import type { Role } from '../../shared/schemas/enums';

/** One password for every demo sign-in. */
export const DEMO_PASSWORD = 'maple-demo-2027';

export const DEMO_BUSINESS = 'Fernside Maple Co-op';
export const OWL_LEDGE_NAME = 'Owl Ledge';
export const COBBLE_RUN_NAME = 'Cobble Run';

export interface DemoUser {
  email: string;
  name: string;
  unitSystem: 'imperial' | 'metric';
  /** The one sugarbush this person belongs to, and their role there. */
  sugarbush: typeof OWL_LEDGE_NAME | typeof COBBLE_RUN_NAME;
  role: Role;
}

/** Invented people. The outsider belongs only to the small second stand (for access checks). */
export const DEMO_USERS: readonly DemoUser[] = [
  {
    email: 'owner@fernside.example',
    name: 'Hollis Pembrook',
    unitSystem: 'imperial',
    sugarbush: OWL_LEDGE_NAME,
    role: 'owner',
  },
  {
    email: 'forester@fernside.example',
    name: 'Ines Varga-Toller',
    unitSystem: 'metric',
    sugarbush: OWL_LEDGE_NAME,
    role: 'forester',
  },
  {
    email: 'tapper@fernside.example',
    name: 'Rowan Quist',
    unitSystem: 'imperial',
    sugarbush: OWL_LEDGE_NAME,
    role: 'tapper',
  },
  {
    email: 'consultant@fernside.example',
    name: 'Tamsin Oakhurst',
    unitSystem: 'imperial',
    sugarbush: OWL_LEDGE_NAME,
    role: 'consultant',
  },
  {
    email: 'outsider@elsewhere.example',
    name: 'Casimir Dunleavy',
    unitSystem: 'imperial',
    sugarbush: COBBLE_RUN_NAME,
    role: 'owner',
  },
];

export const demoUser = (role: Role, sugarbush: DemoUser['sugarbush'] = OWL_LEDGE_NAME) =>
  DEMO_USERS.find((u) => u.role === role && u.sugarbush === sugarbush)!;
