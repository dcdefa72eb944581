import { useEffect, useId, useRef, type ReactNode } from 'react';
import { Button } from './button';

/**
 * A question that must be answered before going on: a modal `<dialog>` (focus stays inside,
 * Escape cancels), with the safe choice focused first.
 */
export function ConfirmDialog({
  open,
  title,
  children,
  confirmLabel,
  cancelLabel = 'Cancel',
  danger = false,
  onConfirm,
  onCancel,
}: {
  open: boolean;
  title: string;
  children?: ReactNode;
  confirmLabel: string;
  cancelLabel?: string;
  danger?: boolean;
  onConfirm: () => void;
  onCancel: () => void;
}) {
  const ref = useRef<HTMLDialogElement>(null);
  const titleId = useId();
  const bodyId = useId();

  useEffect(() => {
    const dialog = ref.current;
    if (!dialog) return;
    if (open && !dialog.open) dialog.showModal();
    if (!open && dialog.open) dialog.close();
  }, [open]);

  return (
    <dialog
      ref={ref}
      aria-labelledby={titleId}
      aria-describedby={children ? bodyId : undefined}
      onCancel={(event) => {
        event.preventDefault();
        onCancel();
      }}
      className="m-auto max-w-md rounded border border-paper-edge bg-paper p-4 text-ink shadow-lg backdrop:bg-ink/40"
    >
      {open && (
        <>
          <h2 id={titleId} className="font-serif text-xl">
            {title}
          </h2>
          {children && (
            <div id={bodyId} className="mt-2 text-sm text-ink-soft">
              {children}
            </div>
          )}
          <div className="mt-4 flex flex-wrap justify-end gap-2">
            <Button autoFocus onClick={onCancel}>
              {cancelLabel}
            </Button>
            <Button tone={danger ? 'danger' : 'primary'} onClick={onConfirm}>
              {confirmLabel}
            </Button>
          </div>
        </>
      )}
    </dialog>
  );
}
