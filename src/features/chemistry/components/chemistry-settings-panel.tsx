import { useQuery } from '@tanstack/react-query';
import { useState } from 'react';
import type { ChemistrySettingView } from '@shared/types/chemistry';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import { chemistryQueries } from '../api/chemistry-queries';
import { useUpdateChemistrySettings } from '../api/update-settings';

/** The chemistry settings, each with where its default comes from; admins may change them. */
export function ChemistrySettingsPanel() {
  const settings = useQuery(chemistryQueries.settings());
  const can = useCan();
  return (
    <section aria-labelledby="chemistry-settings" className="max-w-3xl">
      <h2 id="chemistry-settings" className="mb-2 text-xl">
        Settings
      </h2>
      {settings.error && <ErrorNotice error={settings.error} />}
      {!settings.data && !settings.error && <Loading />}
      <ul className="flex flex-col gap-3">
        {settings.data?.items.map((item) => (
          <SettingRow key={item.key} item={item} editable={can('settings:write')} />
        ))}
      </ul>
    </section>
  );
}

function SettingRow({ item, editable }: { item: ChemistrySettingView; editable: boolean }) {
  const update = useUpdateChemistrySettings();
  const [draft, setDraft] = useState(String(item.value));
  const changed = Number(draft) !== item.value;
  return (
    <li className="rounded border border-paper-edge bg-white/60 p-3 text-sm">
      <div className="flex flex-wrap items-end gap-3">
        <p className="min-w-48 flex-1">
          <strong>{item.label}</strong>: {item.value} {item.unit}
          {item.value !== item.defaultValue && (
            <span className="text-ink-faint"> (default {item.defaultValue})</span>
          )}
        </p>
        {editable && (
          <form
            className="flex items-end gap-2"
            onSubmit={(event) => {
              event.preventDefault();
              update.mutate({ [item.key]: Number(draft) });
            }}
          >
            <TextField
              label={`New value (${item.unit})`}
              type="number"
              step="any"
              min={item.min}
              max={item.max}
              value={draft}
              onChange={(event) => setDraft(event.target.value)}
            />
            <Button type="submit" tone="primary" disabled={!changed || update.isPending}>
              Save
            </Button>
            {item.value !== item.defaultValue && (
              <Button
                onClick={() => {
                  setDraft(String(item.defaultValue));
                  update.mutate({ [item.key]: null });
                }}
              >
                Use default
              </Button>
            )}
          </form>
        )}
      </div>
      <p className="mt-1 text-xs text-ink-faint">Default: {item.source}</p>
      <ErrorNotice error={update.error} className="mt-2" />
    </li>
  );
}
