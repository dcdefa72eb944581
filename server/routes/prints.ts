import { Router, type Request, type Response } from 'express';
import { roleCan } from '../../shared/domain/roles';
import type { PrintListItem } from '../../shared/types/catalogue';
import { stringify } from 'csv-stringify/sync';
import { IdParamsSchema } from '../../shared/schemas/common';
import { todayIso } from '../../shared/domain/tone/check-date';
import {
  PrintCreateSchema,
  PrintQuerySchema,
  PrintUpdateSchema,
  type PrintCreate,
  type PrintQuery,
  type PrintUpdate,
} from '../../shared/schemas/print';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { mayListDeletedPrints, mayUpdatePrintFields } from '../policies/print';
import { presentPrint } from '../presenters/print';
import { deletePrint, restorePrint, updatePrint } from '../services/prints/change-print';
import { createPrint } from '../services/prints/create-print';
import { forEachMatchingPage, listPrints, type Asker } from '../services/prints/list-prints';
import { readPrint } from '../services/prints/read-print';
import { REGISTRAR_CSV_COLUMNS, registrarCsvCells } from '../services/registrar/csv-cells';

type Params = { id: number };

/**
 * A viewer's words never match a print's place (design §2: places are curator+); only
 * archivists' and admins' words match marks kept private (issue 19).
 */
export const askerOf = (req: Request): Asker => ({
  includePlace: roleCan(currentUser(req).role, 'locations:read'),
  includePrivate: roleCan(currentUser(req).role, 'registrar:confidential'),
});

/** `/api/prints`: the catalogue. */
export function printsRouter(ctx: AppContext): Router {
  const router = Router();
  const commandContext = (user: ReturnType<typeof currentUser>) => ({ ...ctx, user });

  router.get(
    '/',
    requireAbility('catalogue:read'),
    validate(PrintQuerySchema, 'query'),
    async (req, res) => {
      const query = parsed<PrintQuery>(res, 'query');
      if (query.deleted && !mayListDeletedPrints(currentUser(req).role)) throw problems.forbidden();
      res.json(await listPrints(query, ctx.searchIndex, askerOf(req)));
    },
  );

  router.post(
    '/',
    requireAbility('prints:write'),
    validate(PrintCreateSchema),
    async (req, res) => {
      const user = currentUser(req);
      const { print, locationPath } = await createPrint(
        commandContext(user),
        parsed<PrintCreate>(res),
      );
      res
        .status(201)
        .location(`/api/prints/${print.id}`)
        .json(presentPrint(print, user.role, locationPath));
    },
  );

  router.get(
    '/:id',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<Params>(res, 'params');
      const { print, locationPath } = await readPrint(ctx.sequelize, id);
      res.json(presentPrint(print, currentUser(req).role, locationPath));
    },
  );

  router.patch(
    '/:id',
    requireAbility('prints:edit-curatorial'),
    validate(IdParamsSchema, 'params'),
    validate(PrintUpdateSchema),
    async (req, res) => {
      const user = currentUser(req);
      const body = parsed<PrintUpdate>(res);
      if (!mayUpdatePrintFields(user.role, Object.keys(body))) {
        throw problems.forbidden('Your role may change only the title, description and tags.');
      }
      const { id } = parsed<Params>(res, 'params');
      const { print, locationPath } = await updatePrint(commandContext(user), id, body);
      res.json(presentPrint(print, user.role, locationPath));
    },
  );

  router.delete(
    '/:id',
    requireAbility('prints:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      await deletePrint(commandContext(currentUser(req)), parsed<Params>(res, 'params').id);
      res.status(204).end();
    },
  );

  router.post(
    '/:id/restore',
    requireAbility('prints:write'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const user = currentUser(req);
      const { id } = parsed<Params>(res, 'params');
      const { print, locationPath } = await restorePrint(commandContext(user), id);
      res.json(presentPrint(print, user.role, locationPath));
    },
  );

  return router;
}

const CSV_COLUMNS = [
  'accessionNumber',
  'title',
  'maker',
  'madeOn',
  'process',
  'paper',
  'fixingMinutes',
  'washingMinutes',
  'toneStatus',
  'processingRisk',
  'status',
  ...REGISTRAR_CSV_COLUMNS,
] as const;

/** Text a spreadsheet would run as a formula is quoted with a leading apostrophe (OWASP, "CSV Injection"). */
function defuse(value: string): string {
  return /^[=+\-@\t\r]/.test(value) ? `'${value}` : value;
}

/** `/api/prints.csv`: a list of every match of the same query, streamed page by page. */
export function printsCsvRouter(ctx: AppContext): Router {
  return Router().get(
    '/',
    requireAbility('exports:read'),
    validate(PrintQuerySchema, 'query'),
    async (req, res) => {
      const query = parsed<PrintQuery>(res, 'query');
      if (query.deleted && !mayListDeletedPrints(currentUser(req).role)) throw problems.forbidden();
      res.type('text/csv; charset=utf-8').attachment(`printwarden-prints-${todayIso()}.csv`);
      await writeCsv(res, ctx.sequelize, (onPage) =>
        forEachMatchingPage(query, ctx.searchIndex, askerOf(req), onPage),
      );
    },
  );
}

/** Writes the header, then each page of rows as it comes, waiting when the client is slow. */
export async function writeCsv(
  res: Response,
  sequelize: AppContext['sequelize'],
  pages: (onPage: (items: PrintListItem[]) => Promise<void>) => Promise<void>,
): Promise<void> {
  const write = async (text: string) => {
    if (!res.write(text)) await new Promise((resolve) => res.once('drain', resolve));
  };
  await write(stringify([[...CSV_COLUMNS]]));
  await pages(async (items) => {
    const registrar = await registrarCsvCells(
      sequelize,
      items.map((item) => item.id),
    );
    const rows = items.map((item) => ({
      ...item,
      paper: item.paper?.name ?? '',
      ...registrar.get(item.id),
    }));
    await write(stringify(rows, { columns: [...CSV_COLUMNS], cast: { string: defuse } }));
  });
  res.end();
}
