import { Router } from 'express';
import type { AppContext } from '../../context';
import { accessOf, requirePermission, sugarbushAccess } from '../../middleware/auth';
import { parsed, validate } from '../../middleware/validate';
import {
  weatherDayInputSchema,
  weatherImportFieldsSchema,
  weatherQuerySchema,
  type WeatherDayInput,
  type WeatherImportFields,
} from '../../../shared/schemas/weather';
import { receiveStationFile } from './receive-station-file';
import { weatherService } from './weather.service';

/** `?dryRun=1` as the other imports take it, beside the form field. */
const importQuerySchema = weatherImportFieldsSchema.pick({ dryRun: true }).strict();

export function weatherRoutes(ctx: AppContext) {
  const router = Router();
  const service = weatherService(ctx);

  router.get(
    '/sugarbushes/:id/weather',
    sugarbushAccess(ctx.db),
    validate({ query: weatherQuerySchema.strict() }),
    async (_req, res) => {
      const { season } = parsed<{ season?: number }>(res, 'query');
      res.json(await service.season(accessOf(res).sugarbushId, season));
    },
  );

  router.post(
    '/sugarbushes/:id/weather',
    sugarbushAccess(ctx.db),
    requirePermission('record-season-log'),
    validate({ body: weatherDayInputSchema }),
    async (_req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const input = parsed<WeatherDayInput>(res, 'body');
      const { entry, created } = await service.record(sugarbushId, userId, input);
      res.status(created ? 201 : 200).json(entry);
    },
  );

  router.post(
    '/sugarbushes/:id/weather/imports',
    sugarbushAccess(ctx.db),
    requirePermission('record-season-log'),
    validate({ query: importQuerySchema }),
    receiveStationFile(ctx.config),
    validate({ body: weatherImportFieldsSchema.strict() }),
    async (req, res) => {
      const { sugarbushId, userId } = accessOf(res);
      const fields = parsed<WeatherImportFields>(res, 'body');
      const query = parsed<WeatherImportFields>(res, 'query');
      const result = await service.importFile(sugarbushId, userId, req.file!.buffer, {
        ...fields,
        dryRun: Boolean(fields.dryRun || query.dryRun),
      });
      res.status(!result.dryRun && result.added + result.replaced > 0 ? 201 : 200).json(result);
    },
  );

  return router;
}
