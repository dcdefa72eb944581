import { useQuery } from '@tanstack/react-query';
import { useState, type FormEvent } from 'react';
import { SETTING_AREAS, type SettingArea } from '@shared/domain/settings';
import type { SettingsResponse } from '@shared/types/settings';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { isForbidden, NoAccess } from '@/components/ui/no-access';
import { ChemicalCaution, ErrorNotice, Loading } from '@/components/ui/notices';
import { PageHeader } from '@/components/ui/page-header';
import { ApiError } from '@/lib/api-client';
import { useCan } from '@/lib/session';
import { settingsQueries, useSaveSettings } from '@/lib/settings-api';

const AREA_TITLES: Record<SettingArea, string> = {
  tone: 'Tone watch thresholds',
  schedule: 'Tone check intervals',
  chemistry: 'Chemistry',
  environment: 'Storage environment',
  light: 'Light on display (annual limits)',
};

/** Every area's settings with where each default comes from; admins change them. */
export function SettingsPage() {
  const can = useCan();
  const allowed = can('settings:read');
  const settings = useQuery({
    ...settingsQueries.current(),
    enabled: allowed,
    refetchInterval: (query) =>
      query.state.data?.reevaluation?.status === 'running' ? 1000 : false,
  });
  if (!allowed || isForbidden(settings.error)) {
    return (
      <>
        <PageHeader title="Settings" />
        <NoAccess area="Settings" needs="settings:read" />
      </>
    );
  }
  if (settings.isPending) return <Loading label="Loading settings…" />;
  if (settings.error) return <ErrorNotice error={settings.error} />;
  return (
    <>
      <PageHeader title="Settings" />
      <SettingsForm settings={settings.data} editable={can('settings:write')} />
    </>
  );
}

function SettingsForm({ settings, editable }: { settings: SettingsResponse; editable: boolean }) {
  const save = useSaveSettings();
  const [values, setValues] = useState<Record<string, string>>(() =>
    Object.fromEntries(
      Object.keys(settings.sources).map((key) => {
        const [area, name] = key.split('.') as [SettingArea, string];
        return [key, String((settings[area] as unknown as Record<string, number>)[name])];
      }),
    ),
  );
  const errors = save.error instanceof ApiError ? save.error.errors : [];
  const submit = (event: FormEvent) => {
    event.preventDefault();
    const patch: Record<SettingArea, Record<string, number>> = {
      tone: {},
      schedule: {},
      chemistry: {},
      environment: {},
      light: {},
    };
    for (const [key, value] of Object.entries(values)) {
      const [area, name] = key.split('.') as [SettingArea, string];
      patch[area][name] = Number(value);
    }
    save.mutate(patch);
  };
  const progress = settings.reevaluation;
  return (
    <form onSubmit={submit} aria-label="Settings" className="max-w-3xl space-y-4">
      {!editable && (
        <p className="text-sm text-ink-soft">
          Only an administrator may change these; they are shown read-only.
        </p>
      )}
      {SETTING_AREAS.map((area) => (
        <fieldset key={area} className="space-y-3">
          <legend className="mb-2 text-lg">{AREA_TITLES[area]}</legend>
          <div className="grid gap-4 sm:grid-cols-2">
            {Object.entries(settings.sources)
              .filter(([key]) => key.startsWith(`${area}.`))
              .map(([key, { label, source, unit, defaultValue }]) => (
                <TextField
                  key={key}
                  label={unit ? `${label} (${unit})` : label}
                  type="number"
                  step="any"
                  value={values[key] ?? ''}
                  // Read-only rather than disabled: still focusable, announced as read-only.
                  readOnly={!editable}
                  onChange={(e) => setValues((v) => ({ ...v, [key]: e.target.value }))}
                  hint={`Default ${defaultValue}: ${source}`}
                  error={errors.find((error) => error.path === key)?.message}
                />
              ))}
          </div>
          {area === 'chemistry' && (
            <ChemicalCaution chemicals={['sodium thiosulfate', 'silver nitrate']} />
          )}
        </fieldset>
      ))}
      {save.error && !(save.error instanceof ApiError && save.error.status === 422) && (
        <ErrorNotice error={save.error} />
      )}
      {editable && (
        <Button type="submit" tone="primary" disabled={save.isPending}>
          Save and re-evaluate every print
        </Button>
      )}
      {/* While a save is on its way the last run's line would read as its confirmation. */}
      {save.isPending && (
        <p role="status" className="text-sm">
          Saving the settings…
        </p>
      )}
      {/* A refused save changed nothing; the last run's line would read as its answer. */}
      {save.isError && (
        <p role="status" className="text-sm text-alert">
          Not saved: nothing was changed and no print was re-evaluated.
          {errors.length > 0 ? ' Correct the fields marked above and save again.' : ''}
        </p>
      )}
      {progress && !save.isPending && !save.isError && (
        <div role="status" className="text-sm">
          {progress.status === 'running'
            ? `Re-evaluating prints: ${progress.done} of ${progress.total}…`
            : progress.status === 'done'
              ? `Every print re-evaluated (${progress.total}) at ${progress.finishedAt?.slice(11, 16)} UTC.`
              : progress.status === 'stopped'
                ? `The re-evaluation stopped at ${progress.done} of ${progress.total} when a server stopped; it carries on from there when a server starts.`
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
