import type { AdvisorWarning } from '@shared/rules/index';
import { WhyDisclosure } from '@/components/ui/why-disclosure';
import { WarningMark } from '@/components/warning-chip';
import { warningLabel } from '@/lib/warning-labels';

/** Each warning: its name, what it means for this tree, and where the rule comes from. */
export function WarningList({ warnings }: { warnings: AdvisorWarning[] }) {
  if (warnings.length === 0) return null;
  return (
    <section aria-labelledby="advice-warnings-heading">
      <h3 id="advice-warnings-heading" className="font-bold">
        Warnings
      </h3>
      <ul className="mt-2 flex flex-col gap-3">
        {warnings.map((w, i) => (
          <li key={`${w.code}-${i}`} className="flex gap-2">
            <span className="mt-0.5">
              <WarningMark code={w.code} />
            </span>
            <div className="min-w-0">
              <p>
                <span className="font-bold">{warningLabel(w.code)}.</span> {w.message}
              </p>
              {w.source && <WhyDisclosure source={w.source} />}
            </div>
          </li>
        ))}
      </ul>
    </section>
  );
}
