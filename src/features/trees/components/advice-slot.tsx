/** The season the advisor plans next: the coming spring once this one's sap run is over. */
export function upcomingSeason(today = new Date()): number {
  const year = today.getFullYear();
  return today.getMonth() >= 5 ? year + 1 : year;
}

/**
 * Where this tree's advice for the coming season will sit: how many taps, at which
 * heights and bearings, and why. Filled in once the advisor is connected.
 */
export function AdviceSlot({ season = upcomingSeason() }: { season?: number }) {
  return (
    <section
      aria-labelledby="advice-heading"
      className="rounded border border-rule bg-frost/40 p-4"
      data-slot="tree-advice"
    >
      <h2 id="advice-heading" className="text-lg font-bold">
        Advice for {season}
      </h2>
      <p className="mt-1 max-w-prose text-bark">
        How many taps this tree can take, and where to drill them, will appear here when the advisor
        arrives in Clearwood.
      </p>
    </section>
  );
}
