import {
  DEFAULT_ENVIRONMENT_SETTINGS,
  type EnvironmentSettings,
} from '../../../shared/domain/environment/settings';

/** The environment area's settings (defaults until the settings store carries the area). */
export function readEnvironmentSettings(): Promise<EnvironmentSettings> {
  return Promise.resolve({ ...DEFAULT_ENVIRONMENT_SETTINGS });
}
