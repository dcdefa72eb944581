import type { Canvas, Manifest } from '@iiif/presentation-3';
import {
  ASSET_VIEW_LABELS,
  ASSET_VIEWS,
  DERIVATIVE_LONG_SIDE,
} from '../../shared/domain/asset-views';
import type { Asset, Print } from '../models';
import { assetUrls } from './asset';

/** Width and height after fitting inside a square of `side` without enlarging (as sharp does). */
function fitInside(width: number, height: number, side: number) {
  const scale = Math.min(1, side / Math.max(width, height));
  return { width: Math.round(width * scale), height: Math.round(height * scale) };
}

function canvasOf(origin: string, printId: number, asset: Asset): Canvas {
  const canvasId = `${origin}/api/prints/${printId}/manifest/canvas/${asset.id}`;
  const urls = assetUrls(asset.id);
  const web = fitInside(asset.width, asset.height, DERIVATIVE_LONG_SIDE.web);
  const thumb = fitInside(asset.width, asset.height, DERIVATIVE_LONG_SIDE.thumbnail);
  return {
    id: canvasId,
    type: 'Canvas',
    label: { en: [ASSET_VIEW_LABELS[asset.view]] },
    width: asset.width,
    height: asset.height,
    thumbnail: [
      { id: `${origin}${urls.thumbnail}`, type: 'Image', format: 'image/jpeg', ...thumb },
    ],
    items: [
      {
        id: `${canvasId}/page`,
        type: 'AnnotationPage',
        items: [
          {
            id: `${canvasId}/page/image`,
            type: 'Annotation',
            motivation: 'painting',
            target: canvasId,
            body: {
              id: `${origin}${urls.web}`,
              type: 'Image',
              format: 'image/jpeg',
              ...web,
              service: [{ id: `${origin}${urls.iiif}`, type: 'ImageService3', profile: 'level0' }],
            },
          },
        ],
      },
    ],
  };
}

/**
 * A IIIF Presentation 3.0 manifest of a print's images, recto first, each painted from
 * its web image with the level-0 Image API service of this server for deep zoom.
 */
export function presentManifest(origin: string, print: Print, assets: Asset[]): Manifest {
  const ordered = [...assets].sort(
    (a, b) => ASSET_VIEWS.indexOf(a.view) - ASSET_VIEWS.indexOf(b.view) || a.id - b.id,
  );
  const metadata = [
    ['Accession number', print.accessionNumber],
    ['Maker', print.maker],
    ['Made', print.madeOn],
    ['Process', print.process],
  ].filter((pair): pair is [string, string] => Boolean(pair[1]));
  return {
    '@context': 'http://iiif.io/api/presentation/3/context.json',
    id: `${origin}/api/prints/${print.id}/manifest.json`,
    type: 'Manifest',
    label: { en: [`${print.accessionNumber} ${print.title}`] },
    metadata: metadata.map(([label, value]) => ({
      label: { en: [label] },
      value: { none: [value] },
    })),
    homepage: [{ id: `${origin}/prints/${print.id}`, type: 'Text', format: 'text/html' }],
    behavior: ['individuals'],
    items: ordered.map((asset) => canvasOf(origin, print.id, asset)),
  };
}
