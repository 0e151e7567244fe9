import {
  basalArea,
  growthCmPerYear,
  holes,
  lastTapped,
  latest,
  note,
  size,
  type NoteDraft,
} from './note-helpers';
import type { ProblemCategory, TreePlan } from './types';

type Writer = (p: TreePlan) => Omit<NoteDraft, 'tag' | 'createdAt'>[];

export const writers: Record<ProblemCategory, Writer> = {
  'too-small': (p) => {
    const d = latest(p).dbhCm;
    const rate = Math.max(0.05, growthCmPerYear(p));
    if (30.48 - d < 1.5)
      return [
        note(
          'follow-up',
          `At ${size(d)} this tree is just short of the 12 in minimum. Put a tape on it before ` +
            `tapping in 2027 and leave it untapped unless it reads 30.5 cm or more.`,
          '2027-02-15',
        ),
      ];
    const years = Math.ceil((30.48 - d) / rate);
    return [
      note(
        'health',
        `${size(d)} DBH, under the 12 in minimum. Leave it untapped; at its present ` +
          `growth it needs roughly ${years} more seasons to reach tapping size.`,
      ),
    ];
  },
  overtapped: (p) => {
    const n = holes(p, 2026).length;
    const d = latest(p).dbhCm;
    const allowed = d < 45.72 ? 'one' : 'two';
    return [
      note(
        'health',
        `${n} holes in 2026 on a ${size(d)} trunk; the conservative set allows ${allowed}. ` +
          `It has carried three or four holes every season since 2022.`,
      ),
      note(
        'tapping',
        `Go back to ${allowed} tap${allowed === 'one' ? '' : 's'} in 2027 and watch the shavings: ` +
          `brown or yellow shavings mean the drill found stained wood.`,
      ),
    ];
  },
  'too-close': (p) => {
    const [now] = holes(p, 2026);
    const [before] = holes(p, 2025);
    const d = latest(p).dbhCm;
    const gap = Math.abs(now.azimuthDeg - before.azimuthDeg);
    const side = (Math.min(gap, 360 - gap) / 360) * Math.PI * d;
    const up = Math.abs(now.heightCm - before.heightCm);
    return [
      note(
        'health',
        `The 2026 hole is about ${side.toFixed(0)} cm round the trunk from the 2025 hole and ` +
          `${up < 1 ? 'level with it' : `${up.toFixed(0)} cm above or below it`} — inside last ` +
          `year's column of stained wood.`,
      ),
      note(
        'tapping',
        `Move each new hole at least 4 in round the trunk or a foot up or down from any hole ` +
          `still in reach; a rotation card on the lateral helps the crew keep track.`,
      ),
    ];
  },
  'slow-growth': (p) => {
    const ba = basalArea(p);
    return [
      note(
        'health',
        `Diameter gained only ${growthCmPerYear(p).toFixed(2)} cm a year since 2018: about ` +
          `${ba.grew.toFixed(1)} in² of basal area a year, against the roughly ` +
          `${ba.needed.toFixed(1)} in² even one tap needs at this size. Tapping is outrunning growth.`,
      ),
    ];
  },
  declining: (p) => [
    note(
      'follow-up',
      `Crown dieback has risen from 5 % in 2020 to ${latest(p).crownDiebackPct} % this autumn ` +
        `(over 15 % is cause for concern). Re-rate it in full leaf and check the root collar ` +
        `for cankers.`,
      '2027-07-15',
    ),
  ],
  'severely-declining': (p) => [
    note(
      'hazard',
      `Dieback at ${latest(p).crownDiebackPct} %, with dead limbs hanging over the lateral. ` +
        `No taps in 2027; keep the crew out from under it on windy days.`,
    ),
  ],
  dead: (p) => [
    note(
      'hazard',
      `Dead: no leaves since ${p.measurements.find((m) => m.crownDiebackPct === 100)?.season}. ` +
        `Brittle top over the tubing — have it felled by a trained sawyer before the lines ` +
        `are walked in winter.`,
      '2027-01-15',
    ),
  ],
  'held-out': (p) => [
    note(
      'tapping',
      `Held out since ${lastTapped(p) + 1} as an untapped comparison tree. Keep measuring it ` +
        `each autumn; its growth is the yardstick for the tapped trees around it.`,
    ),
  ],
  removed: () => [
    note(
      'health',
      `Felled in the winter of 2024–25 after it split at the fork over the main line. ` +
        `Stump left high as a marker; the tag is kept on the stump.`,
    ),
  ],
  'stale-measurement': (p) => [
    note(
      'follow-up',
      `No diameter on file since ${latest(p).season}, yet it is tapped every season. ` +
        `Add it to the autumn round.`,
      '2027-10-01',
    ),
  ],
  shrinking: (p) => {
    const bad = p.measurements.find((m, i) => i > 0 && m.dbhCm < p.measurements[i - 1].dbhCm - 1);
    return bad
      ? [
          note(
            'health',
            `The ${bad.season} reading (${bad.dbhCm.toFixed(1)} cm) is about 2 cm under the ` +
              `seasons either side — a slipped tape, not a shrinking tree. Record a correction ` +
              `rather than deleting the row.`,
          ),
        ]
      : [];
  },
  'depleted-zone': (p) => {
    const stained = p.tapholes.filter((t) => t.stainHit).length;
    return [
      note(
        'health',
        `${p.tapholes.length} holes since 2018 on a tree adding ${growthCmPerYear(p).toFixed(2)} ` +
          `cm of diameter a year; ${stained} of them hit stained wood. Little clear wood is left ` +
          `in the tapping band.`,
      ),
    ];
  },
  'outside-boundary': () => [
    note(
      'health',
      `The mapped point falls outside the stand boundary, but the tree stands inside it by ` +
        `the wall. Re-take the GPS point with a longer fix.`,
    ),
  ],
  'newly-tagged': () => [
    note(
      'follow-up',
      `Tagged during the autumn round but the tape was not put on it. Measure it before the ` +
        `plan is drawn up.`,
    ),
  ],
  'wide-spout': () => [
    note(
      'tapping',
      `The last two seasons' holes were drilled with the old 7/16 in bit. Go back to 5/16 in: ` +
        `the wider hole stains more wood for little more sap.`,
    ),
  ],
  'misread-series': () => [
    note(
      'follow-up',
      `Readings since 2022 run about 3 cm under the earlier ones; the first was confirmed at ` +
        `the tree, so the record now reads as a shrinking trunk. Check where the tape goes: ` +
        `4.5 ft up the uphill side, not above the swell. Re-measure and correct the rows.`,
    ),
  ],
  'modest-growth': (p) => {
    const one = basalArea(p, 1);
    const two = basalArea(p, 2);
    return [
      note(
        'tapping',
        `About ${one.grew.toFixed(1)} in² of basal area a year: enough for one tap ` +
          `(${one.needed.toFixed(1)} in²), not the two its size allows (${two.needed.toFixed(1)} ` +
          `in²). One tap in 2027, and thin around it to give the crown room.`,
      ),
    ];
  },
  'first-reading': () => [
    note(
      'tapping',
      `First reading this autumn. One diameter says nothing of growth yet: tap it lightly, if ` +
        `at all, until a second season is on record.`,
    ),
  ],
};

/** How many trees of each category get a note of their own. */
export const NOTED: Record<ProblemCategory, number> = {
  'too-small': 3,
  overtapped: 2,
  'too-close': 2,
  'slow-growth': 2,
  declining: 4,
  'severely-declining': 3,
  dead: 3,
  'held-out': 2,
  removed: 2,
  'stale-measurement': 2,
  shrinking: 2,
  'depleted-zone': 3,
  'outside-boundary': 2,
  'newly-tagged': 1,
  'first-reading': 1,
  'wide-spout': 1,
  'misread-series': 1,
  'modest-growth': 1,
};
