import { Line, LineChart, Tooltip, XAxis, YAxis } from 'recharts';
import type { TrendsResponse } from '@shared/schemas/trends';
import { axisProps, lineProps, tooltipStyle } from '@/components/ui/chart-frame';
import { paths } from '@/config/paths';
import { formatNumber, type UnitSystem } from '@/lib/units';
import { areaWords, basalAreaSentence, basalPerArea } from '../lib/trend-words';
import { ChartBox, chartFont, chartMargin, seasonTick, series, unitTick } from './chart-kit';
import { FigureLink, TrendFigure, TrendTable } from './trend-figure';

/** Basal area per acre or hectare within the boundary, season by season. */
export function BasalAreaTrend({ trends, system }: { trends: TrendsResponse; system: UnitSystem }) {
  const w = areaWords(system);
  const id = trends.sugarbushId;
  const data = trends.items.map((i) => ({
    x: seasonTick(i),
    basal: basalPerArea(i, system),
  }));
  const show = (v: number | null) => (v === null ? '—' : formatNumber(v, w.basalDigits));
  return (
    <TrendFigure
      title={`Basal area per ${w.per}`}
      sentence={basalAreaSentence(trends, system)}
      chart={
        <ChartBox>
          <LineChart data={data} margin={chartMargin}>
            <XAxis dataKey="x" minTickGap={2} {...axisProps(chartFont)} />
            <YAxis width={52} tickFormatter={unitTick(w.basal)} {...axisProps(chartFont)} />
            <Tooltip
              contentStyle={tooltipStyle}
              formatter={(v) => [`${show(Number(v))} ${w.basal}`, `Per ${w.per}`]}
            />
            <Line dataKey="basal" stroke={series[0]} dot={{ r: 3 }} {...lineProps} />
          </LineChart>
        </ChartBox>
      }
      table={
        <TrendTable
          label={`Basal area per ${w.per} by season`}
          items={trends.items}
          columns={[
            {
              key: 'basal',
              header: `${w.basal} per ${w.per}`,
              cell: (i) => (
                <FigureLink to={paths.plan.href(id, { season: i.season, sort: '-dbh' })}>
                  {show(basalPerArea(i, system))}
                </FigureLink>
              ),
            },
            {
              key: 'trees',
              header: 'Living trees with a DBH',
              cell: (i) => (
                <FigureLink to={paths.plan.href(id, { season: i.season, sort: 'dbh' })}>
                  {formatNumber(i.dbhCm?.trees ?? 0)}
                </FigureLink>
              ),
            },
          ]}
        />
      }
    />
  );
}
