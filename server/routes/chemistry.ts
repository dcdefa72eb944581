import { Router } from 'express';
import { ATOMIC_WEIGHTS_SOURCE } from '../../shared/domain/chemistry/atomic-weights';
import { solutionCautions } from '../../shared/domain/chemistry/cautions';
import { findChemical } from '../../shared/domain/chemistry/chemicals';
import { solubilityWarning } from '../../shared/domain/chemistry/solubility';
import { solutionRecipe } from '../../shared/domain/chemistry/solution';
import { SolutionQuerySchema, type SolutionQuery } from '../../shared/schemas/chemistry';
import type { SolutionAnswer } from '../../shared/types/chemistry';
import type { AppContext } from '../context';
import { requireAbility } from '../middleware/authorize';
import { parsed, validate } from '../middleware/validate';

/** `/api/chemistry`: the solution maker (its settings live in `/api/settings`). */
export function chemistryRouter(_ctx: AppContext): Router {
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

  return router;
}
