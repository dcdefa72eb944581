import { createHash, randomUUID } from 'node:crypto';
import { copyFile, mkdir, readFile, stat } from 'node:fs/promises';
import { join } from 'node:path';
import type { Sequelize } from 'sequelize';
import type { User } from '../server/models';
import { addAsset } from '../server/services/assets/add-asset';
import type { BackgroundWork } from '../server/services/background';
import type { ImageServices } from '../server/services/images';
import { demoImageFile, demoImagePlan } from './demo-images';

/**
 * Attaches the generated demo images to the demo prints through the same command as an
 * upload (so hashing, thumbnails and the background queue are the real ones).
 */
export async function seedDemoImages(
  ctx: { sequelize: Sequelize; images: ImageServices; background?: BackgroundWork },
  printIds: number[],
  user: User,
  /** Called after each image is attached (the demo points verso marks at their photograph). */
  onAttached?: (printId: number, assetId: number, view: 'recto' | 'verso') => Promise<void>,
): Promise<number> {
  let count = 0;
  await mkdir(ctx.images.tempDir, { recursive: true });
  for (const { index, images } of demoImagePlan(printIds.length)) {
    // Shutting down: the prints keep the images they have; a later seed never re-runs.
    if (ctx.background?.stopping) break;
    for (const plan of images) {
      const image = await demoImageFile(plan);
      // addAsset moves its file into storage: give it a copy, never the cached drawing.
      const copy = join(ctx.images.tempDir, `${randomUUID()}.upload`);
      await copyFile(image.path, copy);
      const bytes = await readFile(copy);
      const asset = await addAsset(
        { ...ctx, user },
        printIds[index]!,
        {
          path: copy,
          bytes: (await stat(copy)).size,
          sha256: createHash('sha256').update(bytes).digest('hex'),
          // The drawing is cached by its plan; the name people see carries the print's own id.
          originalName: image.name.replace(plan.file, `print-${printIds[index]!}-${plan.view}`),
        },
        plan.view,
      );
      await onAttached?.(printIds[index]!, asset.id, plan.view);
      count += 1;
    }
  }
  return count;
}
