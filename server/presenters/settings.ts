import { settingSources, type AllSettings } from '../../shared/domain/settings';
import type { SettingsResponse } from '../../shared/types/settings';
import type { ReevaluationProgress } from '../../shared/types/tone';

/** The settings in force, where each default comes from, and a running re-evaluation. */
export function presentSettings(
  settings: AllSettings,
  reevaluation: ReevaluationProgress | null,
): SettingsResponse {
  return {
    tone: { ...settings.tone },
    schedule: { ...settings.schedule },
    chemistry: { ...settings.chemistry },
    environment: { ...settings.environment },
    light: { ...settings.light },
    sources: settingSources(),
    reevaluation,
  };
}
