import { shareBands } from '@shared/schemas/share-bands';
import type { TrendsResponse } from '@shared/schemas/trends';
import { paths } from '@/config/paths';
import { colors } from '@/lib/theme';
import { formatNumber } from '@/lib/units';
import { percent, shareSentence } from '../lib/trend-words';
import { PercentStackChart, seasonTick } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** From little clear wood left to plenty: alert to moss, through the accent. */
const bandColours = [
  colors.alert,
  colors.sap,
  colors.advice.reduced,
  colors.advice.rest,
  colors.moss,
];

/** How much clear wood the tapping zones of the trees big enough to tap have left. */
export function ShareTrend({ trends }: { trends: TrendsResponse }) {
  const id = trends.sugarbushId;
  const data = trends.items.map((i) => ({
    x: seasonTick(i),
    ...Object.fromEntries(
      shareBands.map((b) => [
        b.key,
        i.sharedTrees > 0 ? (100 * i.shareBands[b.key]) / i.sharedTrees : 0,
      ]),
    ),
  }));
  return (
    <TrendFigure
      title="Clear wood in the tapping zone"
      sentence={shareSentence(trends)}
      chart={
        <PercentStackChart
          data={data}
          stackId="share"
          series={shareBands.map((g, n) => ({
            key: g.key,
            label: g.label,
            colour: bandColours[n],
          }))}
        />
      }
      table={
        <TrendTable
          label="Clear wood in the tapping zone by season"
          items={trends.items}
          columns={[
            ...shareBands.map((b) => ({
              key: b.key,
              header: b.label,
              cell: (i: (typeof trends.items)[number]) => (
                <FigureLink to={paths.plan.href(id, { season: i.season, share: b.key })}>
                  {formatNumber(i.shareBands[b.key])} ({percent(i.shareBands[b.key], i.sharedTrees)}
                  )
                </FigureLink>
              ),
            })),
            {
              key: 'trees',
              header: 'Trees big enough to tap',
              cell: (i) => formatNumber(i.sharedTrees),
            },
          ]}
        />
      }
    />
  );
}
