/** What the advisor says about a tree this season. The UI shows each with a colour and its letter. */
export const verdicts = [
  {
    key: 'tap',
    label: 'Tap',
    letter: 'T',
    description: 'Tap the full count the guideline table gives.',
  },
  {
    key: 'tap-reduced',
    label: 'Tap fewer',
    letter: 'F',
    description: 'Tap, but fewer holes than the table gives.',
  },
  {
    key: 'rest',
    label: 'Rest',
    letter: 'R',
    description: 'Big enough, but leave it untapped this season.',
  },
  {
    key: 'too-small',
    label: 'Too small',
    letter: 'S',
    description: 'Below the smallest size the guideline taps.',
  },
  {
    key: 'retired',
    label: 'Out of production',
    letter: 'X',
    description: 'Held out, dead or removed.',
  },
  {
    key: 'unmeasured',
    label: 'Measure first',
    letter: 'M',
    description: 'No diameter on record yet.',
  },
] as const;

export type VerdictKey = (typeof verdicts)[number]['key'];
export type Verdict = (typeof verdicts)[number];

export const verdictByKey = Object.fromEntries(verdicts.map((v) => [v.key, v])) as Record<
  VerdictKey,
  Verdict
>;
