import type { GuidelineRule } from '@shared/rules/index';
import { WhyDisclosure } from './why-disclosure';

/** Rules of the guideline that go with a piece of work, each with its source one click away. */
export function RuleList({ rules, label }: { rules: readonly GuidelineRule[]; label: string }) {
  if (rules.length === 0) return null;
  return (
    <ul aria-label={label} className="mt-2 flex flex-col gap-1 text-sm">
      {rules.map((rule) => (
        <li key={rule.text}>
          <p>{rule.text}</p>
          <WhyDisclosure source={rule.source} />
        </li>
      ))}
    </ul>
  );
}

/** What the owner must know about the stand's guideline, in a quiet box that stays put. */
export function GuidelineNotice({ notice }: { notice: string | null | undefined }) {
  if (!notice) return null;
  return (
    <aside
      aria-label="Guideline changed"
      className="mb-3 rounded border-l-4 border-sap bg-sap/10 px-4 py-3 text-sm text-ink"
    >
      <p className="font-bold">Guideline changed</p>
      <p className="mt-1 max-w-prose">{notice}</p>
    </aside>
  );
}
