import { ApiClient } from './helpers/api-client';
import { createCatalogueEntries, sampleDesign } from './helpers/catalogue-factory';
import { useTestApp } from './helpers/test-app';
import { createUser } from './helpers/user-factory';

describe('Request validation shared by every route', () => {
  const t = useTestApp();

  it.each(['0x10', '1e3', '1%20', '01', '+1'])('when an id is written %p, then it answers 400 and nothing is withdrawn', async (id) => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const res = await admin.send('delete', `/api/invitations/${id}`);
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ invitationId: 'must be a positive whole number' });
  });

  it.each([
    ['design.name', (d: Record<string, unknown>) => ({ ...d, name: 'Pale \ud800' })],
    ['design.notes', (d: Record<string, unknown>) => ({ ...d, notes: '\udfff tail' })],
    ['design.mashSteps.0.name', (d: Record<string, unknown>) => ({ ...d, mashSteps: [{ name: '\ud83c', temperatureC: 66, minutes: 60 }] })],
  ])('when a recipe field %s holds a lone surrogate, then it answers 400 naming it and stores nothing', async (field, spoil) => {
    const ids = await createCatalogueEntries(t.db);
    const member = await createUser(t.db);
    const client = await ApiClient.signedIn(t.app, member);
    const res = await client.send('post', '/api/recipes', { design: spoil(sampleDesign(ids) as unknown as Record<string, unknown>), visibility: 'private' });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ [field]: 'must be well-formed Unicode text' });
    expect(await t.db('recipes').where({ owner_user_id: member.id })).toHaveLength(0);
  });

  it('when a clone name or a member change holds a lone surrogate, then it answers 400 too', async () => {
    const admin = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'admin']));
    const res = await admin.send('post', '/api/invitations', { email: 'a\ud800@test.example', roles: ['member'] });
    expect(res.status).toBe(400);
    expect(res.body.fields).toEqual({ email: 'must be well-formed Unicode text' });
  });

  it('when a catalogue change names unknown or deeply nested fields, then it answers 400 and changes and audits nothing', async () => {
    const ids = await createCatalogueEntries(t.db);
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
    let deep: unknown = 1;
    for (let i = 0; i < 40; i++) deep = { deep };
    const path = `/api/ingredients/hops/${ids.hopId}`;

    const unknown = await brewer.send('patch', path, { alphaAcidPercent: 12, colourLovibond: 3 });
    const nested = await brewer.send('patch', path, { alphaAcidPercent: 12, deep });

    expect(unknown.status).toBe(400);
    expect(unknown.body.fields).toEqual({ colourLovibond: 'is not a known field' });
    expect(nested.status).toBe(400);
    expect((await t.db('hops').where({ id: ids.hopId }).first())!.alpha_acid_percent).toBe(10);
    expect(await t.db('audit_log').where({ subject_type: 'hops', subject_id: ids.hopId })).toHaveLength(0);
  });

  it('when a catalogue change is valid, then the audit entry holds exactly the validated change', async () => {
    const ids = await createCatalogueEntries(t.db);
    const brewer = await ApiClient.signedIn(t.app, await createUser(t.db, ['member', 'brewer']));
    const res = await brewer.send('patch', `/api/ingredients/hops/${ids.hopId}`, { alphaAcidPercent: 12.5, name: '  Spaced hop name  ', retired: true });
    expect(res.status).toBe(200);
    const audit = await t.db('audit_log').where({ subject_type: 'hops', subject_id: ids.hopId, action: 'ingredient-changed' });
    expect(audit).toHaveLength(1);
    const detail = typeof audit[0].detail === 'string' ? JSON.parse(audit[0].detail) : audit[0].detail;
    expect(detail).toEqual({ alphaAcidPercent: 12.5, name: 'Spaced hop name', retired: true });
  });
});
