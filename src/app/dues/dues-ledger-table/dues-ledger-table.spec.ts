import { TestBed } from '@angular/core/testing';
import { DuesLedgerMember } from '@shared/dues';
import { DuesLedgerTable } from './dues-ledger-table';

const member = (userId: number, name: string, status: DuesLedgerMember['status'], paidThrough: string | null): DuesLedgerMember => ({
  userId, name, email: `${name.split(' ')[0].toLowerCase()}@example.org`, planName: 'Standard', paidThrough, status, renewByCard: false,
});

const members = [
  member(1, 'Priya Raman', 'paid-up', '2027-03-31'),
  member(2, 'Jonah Weiss', 'due-soon', '2026-12-10'),
  member(3, 'Tomás Lindqvist', 'overdue', '2026-11-30'),
  member(4, 'Ines Varga', 'overdue', null),
];

describe('DuesLedgerTable', () => {
  async function render(): Promise<{ element: HTMLElement; whenStable: () => Promise<void> }> {
    TestBed.configureTestingModule({ imports: [DuesLedgerTable] });
    const fixture = TestBed.createComponent(DuesLedgerTable);
    fixture.componentRef.setInput('members', members);
    await fixture.whenStable();
    return { element: fixture.nativeElement as HTMLElement, whenStable: () => fixture.whenStable() };
  }
  const names = (element: HTMLElement) => [...element.querySelectorAll('tbody th')].map((th) => th.textContent?.trim());

  it('counts the members by standing and shows each one with the paid-through date, or that they never paid', async () => {
    const { element } = await render();

    const toggles = [...element.querySelectorAll('mat-button-toggle')].map((toggle) => toggle.textContent?.trim());
    expect(toggles).toEqual(['All (4)', 'Paid up (1)', 'Due soon (1)', 'Overdue (2)']);
    expect(names(element)).toEqual(['Priya Raman', 'Jonah Weiss', 'Tomás Lindqvist', 'Ines Varga']);
    expect(element.querySelector('tbody tr:last-child td[data-label="Paid through"]')?.textContent?.trim()).toBe('never paid');
  });

  it('shows only the overdue members when that filter is chosen', async () => {
    const { element, whenStable } = await render();

    (element.querySelectorAll('mat-button-toggle button')[3] as HTMLButtonElement).click();
    await whenStable();

    expect(names(element)).toEqual(['Tomás Lindqvist', 'Ines Varga']);
    expect([...element.querySelectorAll('td[data-label="Standing"]')].map((td) => td.textContent?.trim())).toEqual(['Overdue', 'Overdue']);
  });
});
