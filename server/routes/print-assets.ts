import { rm } from 'node:fs/promises';
import { Router, type NextFunction, type Request, type Response } from 'express';
import { AssetUploadSchema, type AssetUploadInput } from '../../shared/schemas/asset';
import { IdParamsSchema } from '../../shared/schemas/common';
import type { AppContext } from '../context';
import { currentUser, requireAbility } from '../middleware/authorize';
import { multipartProblem } from '../middleware/multipart';
import { problems } from '../middleware/problem';
import { parsed, validate } from '../middleware/validate';
import { presentAsset } from '../presenters/asset';
import { addAsset } from '../services/assets/add-asset';
import { assetUpload, receivedFile } from '../services/assets/upload-receiver';

/** multer's own errors as problem details: too large is 413, the rest is bad input. */
const uploadProblem = (error: unknown, limitMb: number) =>
  multipartProblem(error, `Files may be at most ${limitMb} MB.`);

/** `/api/prints/:id/assets`: images of one print. */
export function printAssetsRouter(ctx: AppContext): Router {
  const router = Router({ mergeParams: true });
  const { tempDir, uploadLimitMb } = ctx.images;
  const receive = assetUpload(tempDir, uploadLimitMb);

  router.post(
    '/',
    requireAbility('prints:write'),
    validate(IdParamsSchema, 'params'),
    (req: Request, res: Response, next: NextFunction) =>
      receive(req, res, (error?: unknown) => next(uploadProblem(error, uploadLimitMb))),
    validate(AssetUploadSchema),
    async (req, res) => {
      const file = receivedFile(req);
      if (!file) throw problems.invalid([{ path: 'file', message: 'Attach an image file' }]);
      const { id } = parsed<{ id: number }>(res, 'params');
      const { view, repeat } = parsed<AssetUploadInput>(res);
      const asset = await addAsset({ ...ctx, user: currentUser(req) }, id, file, view, {
        refuseRepeat: repeat === 'refuse',
      });
      res.status(201).location(`/api/assets/${asset.id}`).json(presentAsset(asset));
    },
  );

  // Whatever went wrong after the file arrived, it does not stay on disk.
  router.use(async (error: unknown, req: Request, _res: Response, next: NextFunction) => {
    if (req.file?.path) await rm(req.file.path, { force: true });
    next(error);
  });

  return router;
}
