import { TestBed } from '@angular/core/testing';
import { provideRouter } from '@angular/router';
import { ReferenceTableSummary } from '@shared/reference-tables';
import { ReferenceTableList } from './reference-table-list';

describe('ReferenceTableList', () => {
  async function render(tables: ReferenceTableSummary[], loading: boolean): Promise<HTMLElement> {
    TestBed.configureTestingModule({ providers: [provideRouter([])] });
    const fixture = TestBed.createComponent(ReferenceTableList);
    fixture.componentRef.setInput('tables', tables);
    fixture.componentRef.setInput('loading', loading);
    fixture.componentRef.setInput('timeZone', 'UTC');
    await fixture.whenStable();
    return fixture.nativeElement as HTMLElement;
  }

  it('says the list is loading, not that no table exists, until the list has arrived', async () => {
    const element = await render([], true);

    expect(element.querySelector('section')?.getAttribute('aria-busy')).toBe('true');
    expect(element.textContent).toContain('Loading the uploaded tables');
    expect(element.textContent).not.toContain('No table has been uploaded yet');
  });

  it('says no table has been uploaded once an empty list has arrived', async () => {
    const element = await render([], false);

    expect(element.querySelector('section')?.getAttribute('aria-busy')).toBe('false');
    expect(element.textContent).toContain('No table has been uploaded yet');
  });
});
