import { afterEach, describe, expect, it } from 'vitest';
import { abilitiesOf, type Role } from '../../../shared/domain/roles';
import { printRecordData } from '../../../src/app/route-data';
import { conditionQueries } from '../../../src/features/condition/api/condition-queries';
import { queryClient } from '../../../src/lib/query-client';
import { sessionQueries } from '../../../src/lib/session';

const signIn = (role: Role) =>
  queryClient.setQueryData(sessionQueries.current().queryKey, {
    user: { id: 1, email: `${role}@printwarden.test`, name: role, role },
    abilities: abilitiesOf(role),
    csrfToken: 'token',
  } as never);

const asked = (key: readonly unknown[]) => queryClient.getQueryCache().find({ queryKey: key });
const open = (id: number) =>
  printRecordData({
    params: { id: String(id) },
    request: new Request(`http://host/prints/${id}`),
    context: undefined,
  } as never);

afterEach(() => queryClient.clear());

describe('the record page’s first requests', () => {
  it('do not ask a viewer’s session for condition reports or treatments (403)', () => {
    signIn('viewer');
    open(3);
    expect(asked(conditionQueries.reports(3).queryKey)).toBeUndefined();
    expect(asked(conditionQueries.treatments(3).queryKey)).toBeUndefined();
  });

  it('ask for them for a curator, who may read them', () => {
    signIn('curator');
    open(4);
    expect(asked(conditionQueries.reports(4).queryKey)).toBeDefined();
    expect(asked(conditionQueries.treatments(4).queryKey)).toBeDefined();
  });
});
