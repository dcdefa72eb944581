import { useQuery } from '@tanstack/react-query';
import { Link } from 'react-router-dom';
import { CHEMISTRY_SETTING_KEYS } from '@shared/domain/chemistry/settings';
import { paths } from '@/config/paths';
import { ErrorNotice, Loading } from '@/components/ui/notices';
import { useCan } from '@/lib/session';
import { settingsQueries } from '@/lib/settings-api';

/**
 * The chemistry settings in force, each with where its default comes from. They live in the
 * one settings store: shown to those who may read settings, changed on the Settings page.
 */
export function ChemistrySettingsPanel() {
  const can = useCan();
  const allowed = can('settings:read');
  const settings = useQuery({ ...settingsQueries.current(), enabled: allowed });
  if (!allowed) return null;
  return (
    <section aria-labelledby="chemistry-settings" className="max-w-3xl">
      <h2 id="chemistry-settings" className="mb-2 text-xl">
        Settings
      </h2>
      {settings.error && <ErrorNotice error={settings.error} />}
      {settings.isPending && <Loading />}
      <ul className="flex flex-col gap-3">
        {settings.data &&
          CHEMISTRY_SETTING_KEYS.map((key) => {
            const value = settings.data.chemistry[key];
            const info = settings.data.sources[`chemistry.${key}`];
            return (
              <li key={key} className="rounded border border-paper-edge bg-white/60 p-3 text-sm">
                <p>
                  <strong>{info.label}</strong>: {value} {info.unit}
                  {value !== info.defaultValue && (
                    <span className="text-ink-faint"> (default {info.defaultValue})</span>
                  )}
                </p>
                <p className="mt-1 text-xs text-ink-faint">Default: {info.source}</p>
              </li>
            );
          })}
      </ul>
      {can('settings:write') && (
        <p className="mt-2 text-sm">
          <Link to={paths.settings}>Change them on the Settings page</Link>
        </p>
      )}
    </section>
  );
}
