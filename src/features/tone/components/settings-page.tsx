import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import type { SettingsResponse } from '@shared/types/tone';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/api-client';
import { useCan } from '@/lib/session';
import { useSaveSettings } from '../api/tone-mutations';
import { toneQueries } from '../api/tone-queries';

type Group = 'tone' | 'schedule';

/** Thresholds and intervals with where each default comes from; admins change them. */
export function SettingsPage() {
  const can = useCan();
  const allowed = can('settings:read');
  const settings = useQuery({
    ...toneQueries.settings(),
    enabled: allowed,
    refetchInterval: (query) =>
      query.state.data?.reevaluation?.status === 'running' ? 1000 : false,
  });
  if (!allowed || isForbidden(settings.error)) {
    return (
      <>
        <PageHeader title="Settings" eyebrow="Tone watch" />
        <NoAccess area="Tone watch settings" needs="settings:read" />
      </>
    );
  }
  if (settings.isPending) return <Loading label="Loading settings…" />;
  if (settings.error) return <ErrorNotice error={settings.error} />;
  return (
    <>
      <PageHeader title="Settings" eyebrow="Tone watch" />
      <SettingsForm settings={settings.data} editable={can('settings:write')} />
    </>
  );
}

function SettingsForm({ settings, editable }: { settings: SettingsResponse; editable: boolean }) {
  const save = useSaveSettings();
  const [values, setValues] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      Object.keys(settings.sources).map((key) => {
        const [group, name] = key.split('.') as [Group, string];
        return [key, String((settings[group] as unknown as Record<string, number>)[name])];
      }),
    ),
  );
  const errors = save.error instanceof ApiError ? save.error.errors : [];
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const patch: Record<Group, Record<string, number>> = { tone: {}, schedule: {} };
    for (const [key, value] of Object.entries(values)) {
      const [group, name] = key.split('.') as [Group, string];
      patch[group][name] = Number(value);
    }
    save.mutate(patch);
  };
  const progress = settings.reevaluation;
  return (
    <form onSubmit={submit} aria-label="Tone watch settings" className="max-w-3xl space-y-4">
      {!editable && (
        <p className="text-sm text-ink-soft">Only an administrator may change these.</p>
      )}
      <div className="grid gap-4 sm:grid-cols-2">
        {Object.entries(settings.sources).map(([key, { label, source }]) => (
          <TextField
            key={key}
            label={label}
            type="number"
            step="any"
            value={values[key] ?? ''}
            disabled={!editable}
            onChange={(e) => setValues((v) => ({ ...v, [key]: e.target.value }))}
            hint={source}
            error={errors.find((error) => error.path === key)?.message}
          />
        ))}
      </div>
      {save.error && !(save.error instanceof ApiError && save.error.status === 422) && (
        <ErrorNotice error={save.error} />
      )}
      {editable && (
        <Button type="submit" tone="primary" disabled={save.isPending}>
          Save and re-evaluate every print
        </Button>
      )}
      {progress && (
        <div role="status" className="text-sm">
          {progress.status === 'running'
            ? `Re-evaluating prints: ${progress.done} of ${progress.total}…`
            : progress.status === 'done'
              ? `Every print re-evaluated (${progress.total}) at ${progress.finishedAt?.slice(11, 16)} UTC.`
              : 'The last re-evaluation failed; save again to retry.'}
          {progress.status === 'running' && (
            <progress
              className="ml-2 align-middle"
              max={progress.total || 1}
              value={progress.done}
              aria-label="Re-evaluation progress"
            />
          )}
        </div>
      )}
    </form>
  );
}
