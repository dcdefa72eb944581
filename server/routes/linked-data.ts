import { Router, type Request } from 'express';
import { IdParamsSchema } from '../../shared/schemas/common';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { catalogueDocument, printDocument, printNode } from '../presenters/json-ld';
import { catalogueForLinkedData, printForLinkedData } from '../services/exports/linked-data';

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
      const { print, links } = await printForLinkedData(id);
      res
        .type(JSON_LD)
        .send(JSON.stringify(printDocument(print, { origin: originOf(req), ...links })));
    },
  );
}

/** `/api/prints.jsonld`: the whole catalogue as one collection document. */
export function catalogueJsonLdRouter(): Router {
  return Router().get('/', requireAbility('exports:read'), async (req, res) => {
    const origin = originOf(req);
    const prints = await catalogueForLinkedData();
    const nodes = prints.map(({ print, links }) => printNode(print, { origin, ...links }));
    res
      .type(JSON_LD)
      .attachment('printwarden-catalogue.jsonld')
      .send(JSON.stringify(catalogueDocument(nodes, origin)));
  });
}
