import { Router, type Response } from 'express';
import type { AppContext } from '../../context';
import { accessOf, sugarbushAccess } from '../../middleware/auth';
import type { ImportKind } from '../../../shared/schemas/imports';
import { exportFileName, exportsService } from './exports.service';

/** Every member may take the stand's records out, as every member reads them. */
export function exportsRoutes(ctx: AppContext) {
  const router = Router();
  const service = exportsService(ctx);
  const member = sugarbushAccess(ctx.db);

  const send = async (res: Response, type: string, name: string, write: () => Promise<void>) => {
    res.type(type).attachment(name).set('Cache-Control', 'private, no-store');
    try {
      await write();
    } catch (err) {
      // Once the first rows are out the status is sent: end the download short, never pretend.
      if (!res.headersSent) throw err;
      ctx.log.error('An export stopped part-way', err);
      res.destroy();
    }
  };

  const csvRoute = (path: string, kind: ImportKind, what: string) =>
    router.get(`/sugarbushes/:id/${path}`, member, async (_req, res) => {
      const { sugarbushId } = accessOf(res);
      const name = exportFileName(await service.standName(sugarbushId), what, 'csv');
      await send(res, 'text/csv; charset=utf-8', name, () => service.csv(sugarbushId, kind, res));
    });

  csvRoute('export.csv', 'trees', 'trees');
  csvRoute('export/measurements.csv', 'measurements', 'measurements');
  csvRoute('export/tapholes.csv', 'tapholes', 'tapholes');

  router.get('/sugarbushes/:id/export.geojson', member, async (_req, res) => {
    const { sugarbushId } = accessOf(res);
    const name = exportFileName(await service.standName(sugarbushId), 'trees', 'geojson');
    await send(res, 'application/geo+json; charset=utf-8', name, () =>
      service.geojson(sugarbushId, res),
    );
  });

  return router;
}
