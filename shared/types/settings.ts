import type { AllSettings, SettingKey, SettingSource } from '../domain/settings';
import type { ReevaluationProgress } from './tone';

/** `GET`/`PATCH /api/settings`: every area's values, where each default comes from, and the
 * progress of the tone re-evaluation a change started. */
export interface SettingsResponse extends AllSettings {
  sources: Record<SettingKey, SettingSource>;
  reevaluation: ReevaluationProgress | null;
}
