import { Router, type Request } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { requireAbility } from '../middleware/authorize';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { Paper, Print } from '../models';
import { catalogueDocument, printDocument, printNode } from '../presenters/json-ld';
import { recordLinksOf } from '../services/exports/record-links';

const JSON_LD = 'application/ld+json; charset=utf-8';

const originOf = (req: Request) => `${req.protocol}://${req.get('host')}`;

/** `/api/prints/:id.jsonld`: one print in open vocabularies (schema.org, Dublin Core). */
export function printJsonLdRouter(): Router {
  return Router().get(
    '/:id.jsonld',
    requireAbility('catalogue:read'),
    validate(IdParamsSchema, 'params'),
    async (req, res) => {
      const { id } = parsed<{ id: number }>(res, 'params');
      const print = await Print.findByPk(id, { include: [{ model: Paper, as: 'paper' }] });
      if (!print) throw problems.notFound('The print');
      const links = await recordLinksOf([print.id]);
      res
        .type(JSON_LD)
        .send(
          JSON.stringify(printDocument(print, { origin: originOf(req), ...links.get(print.id) })),
        );
    },
  );
}

/** `/api/prints.jsonld`: the whole catalogue as one collection document. */
export function catalogueJsonLdRouter(): Router {
  return Router().get('/', requireAbility('exports:read'), async (req, res) => {
    const origin = originOf(req);
    const prints = await Print.findAll({
      include: [{ model: Paper, as: 'paper' }],
      order: [['accessionNumber', 'ASC']],
    });
    const links = await recordLinksOf(prints.map((print) => print.id));
    const nodes = prints.map((print) => printNode(print, { origin, ...links.get(print.id) }));
    res
      .type(JSON_LD)
      .attachment('printwarden-catalogue.jsonld')
      .send(JSON.stringify(catalogueDocument(nodes, origin)));
  });
}
