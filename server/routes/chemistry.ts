import { Router } from 'express';
import { ATOMIC_WEIGHTS_SOURCE } from '../../shared/domain/chemistry/atomic-weights';
import { solutionCautions } from '../../shared/domain/chemistry/cautions';
import { findChemical } from '../../shared/domain/chemistry/chemicals';
import { solubilityWarning } from '../../shared/domain/chemistry/solubility';
import { solutionRecipe } from '../../shared/domain/chemistry/solution';
import {
  ChemistrySettingsUpdateSchema,
  SolutionQuerySchema,
  type ChemistrySettingsUpdate,
  type SolutionQuery,
} from '../../shared/schemas/chemistry';
import type { SolutionAnswer } from '../../shared/types/chemistry';
import type { AppContext } from '../context';
import { writeTransaction } from '../db/write-transaction';
import { currentUser, requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';
import { recordAudit } from '../services/audit';
import { refreshFixerRisk } from '../services/chemistry/fixer-risk';
import {
  presentChemistrySettings,
  readChemistrySettings,
  writeChemistrySettings,
} from '../services/chemistry/settings';

/** `/api/chemistry`: the solution maker and the chemistry settings. */
export function chemistryRouter(ctx: AppContext): Router {
  const router = Router();

  router.get(
    '/solution',
    requireAbility('catalogue:read'),
    validate(SolutionQuerySchema, 'query'),
    (_req, res) => {
      const query = parsed<SolutionQuery>(res, 'query');
      const chemical = findChemical(query.chemical)!;
      const recipe = solutionRecipe(chemical, query.percent, query.volumeMl);
      const solubility = solubilityWarning(chemical, query.percent);
      const answer: SolutionAnswer = {
        chemical: chemical.name,
        formula: chemical.formula,
        ...recipe,
        atomicWeights: ATOMIC_WEIGHTS_SOURCE,
        cautions: solutionCautions([chemical.name]),
        warnings: solubility ? [solubility] : [],
      };
      res.json(answer);
    },
  );

  router.get('/settings', requireAbility('catalogue:read'), async (_req, res) => {
    res.json(presentChemistrySettings(await readChemistrySettings()));
  });

  router.patch(
    '/settings',
    requireAbility('settings:write'),
    validate(ChemistrySettingsUpdateSchema),
    async (req, res) => {
      const input = parsed<ChemistrySettingsUpdate>(res);
      const view = await writeTransaction(ctx.sequelize, async (transaction) => {
        const before = presentChemistrySettings(await readChemistrySettings(transaction));
        await writeChemistrySettings(input, transaction);
        const after = presentChemistrySettings(await readChemistrySettings(transaction));
        // The fixer capacity decides which prints break the capacity rule.
        if (input.fixerCapacitySheetsPerLitre !== undefined) {
          await refreshFixerRisk('all', transaction);
        }
        await recordAudit(
          {
            user: currentUser(req),
            action: 'update',
            entity: 'chemistry-settings',
            entityId: 1,
            before,
            after,
          },
          transaction,
        );
        return after;
      });
      res.json(view);
    },
  );

  return router;
}
