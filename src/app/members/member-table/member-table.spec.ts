import { ComponentFixture, TestBed } from '@angular/core/testing';
import { Member } from '@shared/members';
import { generateMockMember } from '@app/testing/member-mock';
import { ActiveChange, MemberTable, RolesChange } from './member-table';

describe('MemberTable', () => {
  let fixture: ComponentFixture<MemberTable>;
  const jonah = generateMockMember();
  const ada = generateMockMember({
    id: 22,
    name: 'Ada Okafor',
    roles: ['member', 'admin'],
    passwordResetRequestedAt: '2026-11-30T08:00:00.000Z',
  });

  async function render(members: Member[], savingMemberIds: number[] = [], timeZone = 'UTC'): Promise<HTMLElement> {
    fixture = TestBed.createComponent(MemberTable);
    fixture.componentRef.setInput('members', members);
    fixture.componentRef.setInput('timeZone', timeZone);
    fixture.componentRef.setInput('savingMemberIds', savingMemberIds);
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  const button = (element: HTMLElement, label: string) =>
    element.querySelector<HTMLButtonElement>(`button[aria-label="${label}"]`)!;

  it('renders one row per member with name, e-mail and state, sorted by name', async () => {
    const element = await render([jonah, ada]);

    const rows = [...element.querySelectorAll('tbody tr')];
    expect(rows).toHaveLength(2);
    expect(rows[0].textContent).toContain('Ada Okafor');
    expect(rows[1].textContent).toContain('Jonah Weiss');
    expect(rows[1].textContent).toContain('jonah.weiss@fernhollow.example');
    expect(rows[1].textContent).toContain('Active');
  });

  it('shows when a reset was requested on the co-op clocks', async () => {
    const late = generateMockMember({ id: 23, name: 'Late Asker', passwordResetRequestedAt: '2026-11-30T23:30:00.000Z' });
    const element = await render([late], [], 'Pacific/Auckland');

    // 23:30 UTC on 30 Nov is 12:30 on 1 Dec in Auckland (UTC+13 in summer).
    expect(element.querySelector('.marker')?.textContent).toContain('Reset requested 1 Dec 2026, 12:30');
  });

  it('marks the roles a member holds as pressed', async () => {
    const element = await render([ada]);

    expect(button(element, 'admin role for Ada Okafor').getAttribute('aria-pressed')).toBe('true');
    expect(button(element, 'brewer role for Ada Okafor').getAttribute('aria-pressed')).toBe('false');
  });

  it('emits the new role list, in the usual order, when a role is added', async () => {
    const element = await render([jonah]);
    const changes: RolesChange[] = [];
    fixture.componentInstance.rolesChanged.subscribe((change) => changes.push(change));

    button(element, 'brewer role for Jonah Weiss').click();

    expect(changes).toEqual([{ memberId: jonah.id, roles: ['member', 'brewer'] }]);
  });

  it('emits the role list without the role when a held role is removed', async () => {
    const element = await render([ada]);
    const changes: RolesChange[] = [];
    fixture.componentInstance.rolesChanged.subscribe((change) => changes.push(change));

    button(element, 'admin role for Ada Okafor').click();

    expect(changes).toEqual([{ memberId: ada.id, roles: ['member'] }]);
  });

  it('does not offer removing the only role a member holds', async () => {
    const element = await render([jonah]);

    expect(button(element, 'member role for Jonah Weiss').disabled).toBe(true);
  });

  it('emits a deactivation for an active member', async () => {
    const element = await render([jonah]);
    const changes: ActiveChange[] = [];
    fixture.componentInstance.activeChanged.subscribe((change) => changes.push(change));

    button(element, 'Deactivate Jonah Weiss').click();

    expect(changes).toEqual([{ memberId: jonah.id, active: false }]);
  });

  it('shows the reset-requested marker and emits a reset link request', async () => {
    const element = await render([ada]);
    const requested: number[] = [];
    fixture.componentInstance.resetLinkRequested.subscribe((id) => requested.push(id));

    button(element, 'Issue a password reset link for Ada Okafor').click();

    expect(element.textContent).toContain('Reset requested');
    expect(requested).toEqual([ada.id]);
  });

  it('disables the actions of a member whose change is being saved', async () => {
    const element = await render([jonah], [jonah.id]);

    expect(button(element, 'Deactivate Jonah Weiss').disabled).toBe(true);
    expect(button(element, 'brewer role for Jonah Weiss').disabled).toBe(true);
  });

  const typeSearch = async (element: HTMLElement, text: string) => {
    const input = element.querySelector<HTMLInputElement>('input[type="search"]')!;
    input.value = text;
    input.dispatchEvent(new Event('input'));
    await fixture.whenStable();
  };

  it('finds a member by part of the name or e-mail, in any case', async () => {
    const element = await render([jonah, { ...ada, email: 'ada@kestrel.example' }]);

    await typeSearch(element, 'OKAF');
    expect([...element.querySelectorAll('tbody th.name')].map((cell) => cell.textContent)).toEqual([expect.stringContaining('Ada Okafor')]);
    await typeSearch(element, 'Kestrel.Example');
    expect([...element.querySelectorAll('tbody th.name')].map((cell) => cell.textContent)).toEqual([expect.stringContaining('Ada Okafor')]);
  });

  it('says that nothing matched when the search finds no one', async () => {
    const element = await render([jonah, ada]);

    await typeSearch(element, 'zebedee');

    expect(element.querySelectorAll('tbody th.name')).toHaveLength(0);
    expect(element.querySelector('tbody [role="status"]')?.textContent).toContain('No member matches “zebedee”.');
  });

  it('shows a large co-op a page at a time, and the search reaches members beyond the first page', async () => {
    const many = Array.from({ length: 60 }, (_, i) => generateMockMember({ id: 100 + i, name: `Member ${String(i).padStart(2, '0')}`, email: `m${i}@fernhollow.example` }));
    const element = await render(many);

    expect(element.querySelectorAll('tbody th.name')).toHaveLength(25);
    await typeSearch(element, 'Member 59');
    expect([...element.querySelectorAll('tbody th.name')].map((cell) => cell.textContent?.trim())).toEqual(['Member 59']);
  });
});
