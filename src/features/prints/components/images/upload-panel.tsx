import clsx from 'clsx';
import { useId, useRef, useState, type DragEvent } from 'react';
import { ASSET_VIEW_LABELS, ASSET_VIEWS, type AssetView } from '@shared/domain/asset-views';
import { formatCount, formatFileSize } from '@shared/domain/format';
import { Button } from '@/components/ui/button';
import { ApiError } from '@/lib/api-client';
import { useInvalidateCatalogue } from '@/lib/catalogue';
import { uploadAsset } from '../../api/assets';

interface Pending {
  key: string;
  file: File;
  view: AssetView;
  progress: number;
  state: 'waiting' | 'sending' | 'stored' | 'failed';
  message?: string;
}

/** A first guess at each file's view: the first is the recto, the second the verso. */
function guessView(index: number, existing: number): AssetView {
  const position = index + existing;
  return position === 0 ? 'recto' : position === 1 ? 'verso' : 'detail';
}

const sameFileKey = (file: File) => `${file.name}\u0000${file.size}\u0000${file.lastModified}`;

/** Drop or choose several scans, pick each one's view, and watch each arrive. */
export function UploadPanel({ printId, existing }: { printId: number; existing: number }) {
  const invalidate = useInvalidateCatalogue();
  const inputId = useId();
  const input = useRef<HTMLInputElement>(null);
  const [items, setItems] = useState<Pending[]>([]);
  const [dragging, setDragging] = useState(false);
  const [notice, setNotice] = useState('');
  const busy = items.some((item) => item.state === 'sending');

  const add = (files: FileList | null) => {
    if (!files) return;
    // A FileList is live: clearing the input empties it, so copy it before React renders.
    const all = [...files];
    const waiting = items.filter((item) => item.state !== 'stored');
    // The same file chosen twice (same name, size and date) would be stored as two images.
    const seen = new Set(waiting.map((item) => sameFileKey(item.file)));
    const chosen = all.filter((file) => {
      const key = sameFileKey(file);
      if (seen.has(key)) return false;
      seen.add(key);
      return true;
    });
    const repeated = all.filter((file) => !chosen.includes(file)).map((file) => file.name);
    setNotice(
      repeated.length
        ? `Already in the list, so not added again: ${[...new Set(repeated)].join(', ')}.`
        : '',
    );
    setItems((current) => {
      const waiting = current.filter((item) => item.state !== 'stored');
      return [
        ...waiting,
        ...chosen.map((file, i) => ({
          key: `${file.name}-${file.size}-${Date.now()}-${i}`,
          file,
          view: guessView(waiting.length + i, existing),
          progress: 0,
          state: 'waiting' as const,
        })),
      ];
    });
  };
  const update = (key: string, change: Partial<Pending>) =>
    setItems((current) =>
      current.map((item) => (item.key === key ? { ...item, ...change } : item)),
    );

  const remove = (key: string) => setItems((current) => current.filter((i) => i.key !== key));
  const waiting = items.filter((item) => item.state === 'waiting');

  // Two at a time: the server answers each once its thumbnail exists. Only the files
  // still waiting go: a failed one is sent again only when asked (Retry).
  const send = async (queue: Pending[]) => {
    const worker = async () => {
      for (let item = queue.shift(); item; item = queue.shift()) {
        const { key } = item;
        update(key, { state: 'sending', progress: 0, message: undefined });
        try {
          await uploadAsset(printId, item.file, item.view, (progress) => update(key, { progress }));
          update(key, { state: 'stored', progress: 1 });
          await invalidate();
        } catch (error) {
          const message = error instanceof ApiError ? error.detail || error.title : 'Failed';
          update(key, { state: 'failed', message });
        }
      }
    };
    await Promise.all([worker(), worker()]);
  };

  const onDrop = (event: DragEvent) => {
    event.preventDefault();
    setDragging(false);
    add(event.dataTransfer.files);
  };

  return (
    <section
      aria-labelledby={`${inputId}-title`}
      className="mt-4 rounded border border-paper-edge p-3"
    >
      <h3 id={`${inputId}-title`} className="text-lg">
        Add images
      </h3>
      <div
        onDragOver={(event) => {
          event.preventDefault();
          setDragging(true);
        }}
        onDragLeave={() => setDragging(false)}
        onDrop={onDrop}
        className={clsx(
          'mt-2 rounded border-2 border-dashed px-4 py-5 text-center text-sm',
          dragging ? 'border-gall bg-gall-light' : 'border-paper-edge',
        )}
      >
        <p>Drop scans here (JPEG, PNG, TIFF 8 or 16 bit, WebP), or</p>
        <label htmlFor={inputId} className="mt-1 inline-block cursor-pointer text-gall underline">
          choose files
        </label>
        <input
          ref={input}
          id={inputId}
          type="file"
          multiple
          accept="image/jpeg,image/png,image/tiff,image/webp,.tif,.tiff"
          className="sr-only"
          onChange={(event) => {
            add(event.target.files);
            event.target.value = '';
          }}
        />
      </div>
      <p role="status" className="mt-2 text-sm text-ink-soft empty:hidden">
        {notice}
      </p>
      {items.length > 0 && (
        <>
          <ul aria-label="Files to upload" className="mt-3 space-y-2">
            {items.map((item) => (
              <li
                key={item.key}
                className="grid grid-cols-[1fr_auto] items-center gap-x-3 gap-y-1 text-sm"
              >
                <span className="truncate" title={item.file.name}>
                  {item.file.name}{' '}
                  <span className="text-ink-faint">({formatFileSize(item.file.size)})</span>
                </span>
                <select
                  aria-label={`View of ${item.file.name}`}
                  value={item.view}
                  disabled={item.state === 'sending' || item.state === 'stored'}
                  onChange={(event) => update(item.key, { view: event.target.value as AssetView })}
                  className="rounded border border-paper-edge bg-paper px-2 py-1"
                >
                  {ASSET_VIEWS.map((view) => (
                    <option key={view} value={view}>
                      {ASSET_VIEW_LABELS[view]}
                    </option>
                  ))}
                </select>
                {item.state === 'failed' ? (
                  <span
                    role="alert"
                    className="rounded border border-alert bg-alert-light px-2 py-0.5 text-xs text-alert"
                  >
                    Not stored: {item.message}
                  </span>
                ) : (
                  <progress
                    max={100}
                    value={Math.round(item.progress * 100)}
                    aria-label={`Upload progress of ${item.file.name}`}
                    className="h-2 w-full accent-gall"
                  />
                )}
                {item.state === 'failed' ? (
                  <span className="flex gap-1">
                    <Button
                      aria-label={`Retry ${item.file.name}`}
                      disabled={busy}
                      onClick={() => void send([item])}
                    >
                      Retry
                    </Button>
                    <Button
                      aria-label={`Remove ${item.file.name}`}
                      disabled={busy}
                      onClick={() => remove(item.key)}
                    >
                      Remove
                    </Button>
                  </span>
                ) : (
                  <span className="text-xs text-ink-faint">
                    {item.state === 'waiting' && 'waiting'}
                    {item.state === 'sending' && `${Math.round(item.progress * 100)}%`}
                    {item.state === 'stored' && 'stored'}
                  </span>
                )}
              </li>
            ))}
          </ul>
          <div className="mt-3 flex gap-2">
            <Button
              tone="primary"
              disabled={busy || waiting.length === 0}
              onClick={() => void send(waiting)}
            >
              {waiting.length === 0 ? 'Upload' : `Upload ${formatCount(waiting.length, 'file')}`}
            </Button>
            <Button disabled={busy} onClick={() => setItems([])}>
              Clear list
            </Button>
          </div>
        </>
      )}
    </section>
  );
}
