import { useId } from 'react';
import { profileKeys, profiles, type CustomProfileInput } from '@shared/rules/index';
import { cn } from '@/components/ui/cn';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import type { LengthUnit } from '@/lib/units';
import { CUSTOM_PROFILE_KEY } from '../lib/custom-profile-form';
import { bandsInCm, bandsLine } from '../lib/profile-words';

interface Choice {
  key: string;
  label: string;
  line: string;
  source: string;
  notes?: readonly string[];
}

function choicesFor(saved: CustomProfileInput | undefined, unit: LengthUnit): Choice[] {
  const published = profileKeys.map((key): Choice => {
    const p = profiles[key];
    return {
      key,
      label: p.label,
      line: bandsLine(p.bands, unit),
      source: p.source,
      notes: p.notes,
    };
  });
  const custom: Choice = saved
    ? {
        key: CUSTOM_PROFILE_KEY,
        label: `Your own: ${saved.label}`,
        line: bandsLine(bandsInCm(saved), unit),
        source: saved.source ?? 'Custom profile saved by the owner',
        notes: saved.notes,
      }
    : {
        key: CUSTOM_PROFILE_KEY,
        label: 'Your own figures',
        line: 'Start from a published guideline and change its bands, spacing and drilling.',
        source: 'Figures you set for this sugarbush',
      };
  return [...published, custom];
}

const InUse = () => (
  <span className="rounded-sm bg-moss px-1.5 py-0.5 text-sm font-bold text-paper">In use</span>
);

/**
 * The published guidelines and the stand's own, each with its table and its source one click
 * away; the one in use is marked. With `onChoose` they are choices, else a plain list.
 */
export function ProfileChoices({
  current,
  chosen,
  saved,
  unit,
  onChoose,
}: {
  current: string;
  chosen?: string;
  saved: CustomProfileInput | undefined;
  unit: LengthUnit;
  onChoose?: (key: string) => void;
}) {
  const baseId = useId();
  // Reading only, the stand's own figures are listed once there are some.
  const choices = choicesFor(saved, unit).filter(
    (c) => onChoose || saved || c.key !== CUSTOM_PROFILE_KEY,
  );
  if (!onChoose) {
    return (
      <ul aria-label="Guidelines" className="flex flex-col gap-2">
        {choices.map((c) => (
          <li
            key={c.key}
            aria-current={c.key === current || undefined}
            className={cn(
              'rounded border px-4 py-3',
              c.key === current ? 'border-moss' : 'border-rule',
            )}
          >
            <p className="flex flex-wrap items-center gap-2 font-bold">
              {c.label}
              {c.key === current && <InUse />}
            </p>
            <p className="text-sm text-bark tabular-nums">{c.line}</p>
            <WhyDisclosure source={c.source} notes={c.notes} name={`Why? ${c.label}`} />
          </li>
        ))}
      </ul>
    );
  }
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-bold">Guideline for this sugarbush</legend>
      {choices.map((c) => (
        <div
          key={c.key}
          className={cn(
            'rounded border px-4 py-3',
            c.key === chosen ? 'border-sap bg-sap/5' : 'border-rule',
          )}
        >
          <label className="flex min-h-11 cursor-pointer items-start gap-3 md:min-h-0">
            <input
              type="radio"
              name="guideline"
              value={c.key}
              checked={c.key === chosen}
              onChange={() => onChoose(c.key)}
              aria-label={c.label}
              aria-describedby={`${baseId}-${c.key}`}
              className="mt-1 h-5 w-5 shrink-0 accent-sap"
            />
            <span className="flex flex-col">
              <span className="flex flex-wrap items-center gap-2 font-bold">
                {c.label}
                {c.key === current && <InUse />}
              </span>
              <span id={`${baseId}-${c.key}`} className="text-sm text-bark tabular-nums">
                {c.key === current && <span className="sr-only">In use. </span>}
                {c.line}
              </span>
            </span>
          </label>
          <div className="pl-8">
            <WhyDisclosure source={c.source} notes={c.notes} name={`Why? ${c.label}`} />
          </div>
        </div>
      ))}
    </fieldset>
  );
}
