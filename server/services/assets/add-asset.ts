import { rm } from 'node:fs/promises';
import type { Sequelize, Transaction } from 'sequelize';
import type { AssetView } from '../../../shared/domain/asset-views';
import { writeTransaction } from '../../db/write-transaction';
import { HttpProblem, problems } from '../../middleware/problem';
import { Asset, Print, type User } from '../../models';
import { recordAudit } from '../audit';
import { assertPrintExists } from '../prints/assert-print-exists';
import type { ImageServices } from '../images';
import { readCaptureMetadata } from '../images/capture-metadata';
import { writeDerivative } from '../images/derivatives';
import { PROGRESS } from '../images/image-jobs';
import { probeImage, type ProbedImage } from '../images/probe';
import { withHashLock } from './hash-lock';
import { originalKey } from '../storage/storage';
import type { ReceivedFile } from './upload-receiver';

export interface AddAssetContext {
  sequelize: Sequelize;
  images: ImageServices;
  user: User | null;
}

const corrupt = () =>
  new HttpProblem(
    422,
    'Unreadable image',
    'The image is truncated or corrupt; nothing was stored. Export it again and retry.',
  );

/**
 * Checks an uploaded file, stores its original once per SHA-256, makes the thumbnail,
 * records the asset, and queues the web image and tiles. Answers once the original is
 * safe and its thumbnail exists. A rejected file leaves nothing behind.
 */
export async function addAsset(
  ctx: AddAssetContext,
  printId: number,
  file: ReceivedFile,
  view: AssetView,
  options: { refuseRepeat: boolean } = { refuseRepeat: false },
): Promise<Asset> {
  try {
    await assertPrintExists(printId);
    if (options.refuseRepeat) await refuseSameImageTwice(printId, file.sha256);
    const image = await probeImage(file.path);
    // Under the file's lock, so a delete of its last image cannot remove it meanwhile.
    const asset = await withHashLock(ctx.sequelize, file.sha256, () =>
      storeAndRecord(ctx, { printId, file, view, image, refuseRepeat: options.refuseRepeat }),
    );
    // If the queue is closing, the asset stays `processing` and the next start queues it.
    await ctx.images.jobs.request(file.sha256).catch(() => undefined);
    return asset;
  } catch (error) {
    await rm(file.path, { force: true });
    throw error;
  }
}

/**
 * The same file (by SHA-256) on the same print twice is usually a slip, not a second view:
 * the upload panel stored it silently under the next view (the verso). When the caller asks
 * (`repeat: 'refuse'`, as the panel does) it is refused with 409, naming the image it
 * repeats; the same file on another print is fine (the original is stored once).
 */
async function refuseSameImageTwice(
  printId: number,
  sha256: string,
  transaction?: Transaction,
): Promise<void> {
  const already = await Asset.findOne({ where: { printId, sha256 }, transaction });
  if (!already) return;
  const named = already.originalName ? ` (${already.originalName})` : '';
  throw problems.conflict(
    `This image is already on this print as its ${already.view}${named}; nothing was stored. ` +
      'Choose a different file, or remove that image first to upload it under another view.',
  );
}

interface Upload {
  printId: number;
  file: ReceivedFile;
  view: AssetView;
  image: ProbedImage;
  refuseRepeat: boolean;
}

/** Thumbnail, original and record of one upload; what it made goes again if it fails. */
async function storeAndRecord(ctx: AddAssetContext, upload: Upload): Promise<Asset> {
  const { storage, derivatives } = ctx.images;
  const { file, image } = upload;
  let derivativesMade = false;
  try {
    if (!derivatives.has(file.sha256, 'thumbnail')) {
      await derivatives.prepare(file.sha256);
      derivativesMade = true;
      // Decoding every pixel for the thumbnail is also the check that the file is whole.
      await writeDerivative(
        file.path,
        image,
        'thumbnail',
        derivatives.fileOf(file.sha256, 'thumbnail'),
      ).catch(() => {
        throw corrupt();
      });
    }
    const exif = await readCaptureMetadata(file.path, image);
    const key = originalKey(file.sha256);
    await storage.putFile(key, file.path);
    return await recordAsset(ctx, upload, key, exif);
  } catch (error) {
    if (derivativesMade && (await Asset.count({ where: { sha256: file.sha256 } })) === 0) {
      await derivatives.remove(file.sha256);
    }
    throw error;
  }
}

async function recordAsset(
  ctx: AddAssetContext,
  { printId, file, view, image, refuseRepeat }: Upload,
  key: string,
  exif: Asset['exif'],
): Promise<Asset> {
  return writeTransaction(ctx.sequelize, async (transaction) => {
    // Again inside the write lock: two uploads of one file at once record only one.
    if (refuseRepeat) await refuseSameImageTwice(printId, file.sha256, transaction);
    const created = await Asset.create(
      {
        printId,
        view,
        originalName: file.originalName || null,
        mediaType: image.mediaType,
        bytes: file.bytes,
        sha256: file.sha256,
        storageKey: key,
        width: image.width,
        height: image.height,
        bitDepth: image.bitDepth,
        channels: image.channels,
        hasProfile: image.hasProfile,
        exif,
        status: 'processing',
        progress: PROGRESS.thumbnail,
        uploadedBy: ctx.user?.id ?? null,
      },
      { transaction },
    );
    if (view === 'recto') {
      await Print.update({ rectoAssetId: created.id }, { where: { id: printId }, transaction });
    }
    await recordAudit(
      {
        user: ctx.user,
        action: 'create',
        entity: 'asset',
        entityId: created.id,
        after: { printId, view, sha256: file.sha256, originalName: created.originalName },
      },
      transaction,
    );
    return created;
  });
}
