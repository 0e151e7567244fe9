import { env } from '@/config/env';

/** The stand's records as files, each with the header its import reads. */
export const exportLinks = (sugarbushId: number) => {
  const base = `${env.apiBaseUrl}/sugarbushes/${sugarbushId}`;
  return [
    { label: 'Register (CSV)', href: `${base}/export.csv` },
    { label: 'Register (GeoJSON)', href: `${base}/export.geojson` },
    { label: 'Readings (CSV)', href: `${base}/export/measurements.csv` },
    { label: 'Tapholes (CSV)', href: `${base}/export/tapholes.csv` },
  ];
};
