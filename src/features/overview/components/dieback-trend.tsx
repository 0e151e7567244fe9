import { diebackGroups, type TrendSeason, type TrendsResponse } from '@shared/schemas/trends';
import { paths } from '@/config/paths';
import { colors } from '@/lib/theme';
import { formatNumber } from '@/lib/units';
import { diebackSentence, percent } from '../lib/trend-words';
import { PercentStackChart, seasonTick } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

const groupColours = [colors.moss, colors.advice.rest, colors.sap, colors.alert];

const inGroup = (i: TrendSeason, from: number, to: number) =>
  i.crownClasses.filter((c) => c.pct >= from && c.pct <= to).reduce((n, c) => n + c.trees, 0);

/**
 * Crown ratings of each season's round, in the 5 % classes they are given in (USFS Crown
 * Condition Rating Guide): the chart groups them by what they indicate, the table lists each.
 */
export function DiebackTrend({ trends }: { trends: TrendsResponse }) {
  const id = trends.sugarbushId;
  const rated = trends.items.filter((i) => i.crownRated > 0);
  const classes = [...new Set(rated.flatMap((i) => i.crownClasses.map((c) => c.pct)))].sort(
    (a, b) => a - b,
  );
  const data = rated.map((i) => ({
    x: seasonTick(i),
    ...Object.fromEntries(
      diebackGroups.map((g) => [g.key, (100 * inGroup(i, g.fromPct, g.toPct)) / i.crownRated]),
    ),
  }));
  return (
    <TrendFigure
      title="Crown dieback"
      sentence={diebackSentence(trends)}
      chart={
        <PercentStackChart
          data={data}
          stackId="crown"
          series={diebackGroups.map((g, n) => ({
            key: g.key,
            label: g.label,
            colour: groupColours[n],
          }))}
        />
      }
      table={
        <TrendTable
          label="Crown dieback classes by season"
          items={rated}
          columns={[
            ...classes.map((pct) => ({
              key: String(pct),
              header: `${pct} %`,
              cell: (i: TrendSeason) => {
                const n = i.crownClasses.find((c) => c.pct === pct)?.trees ?? 0;
                return n === 0 ? (
                  '0'
                ) : (
                  <FigureLink to={paths.trees.href(id, { dieback: pct, diebackSeason: i.season })}>
                    {formatNumber(n)}
                  </FigureLink>
                );
              },
            })),
            {
              key: 'over',
              header: 'Over 15 %',
              cell: (i) =>
                percent(
                  i.crownClasses.filter((c) => c.pct > 15).reduce((n, c) => n + c.trees, 0),
                  i.crownRated,
                  1,
                ),
            },
            { key: 'rated', header: 'Crowns rated', cell: (i) => formatNumber(i.crownRated) },
          ]}
        />
      }
    />
  );
}
