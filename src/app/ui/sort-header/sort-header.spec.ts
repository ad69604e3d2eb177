import { Component, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { TableSort } from '../table-sort/table-sort';
import { SortHeader } from './sort-header';

@Component({
  imports: [SortHeader],
  template: `<table><thead><tr>
    <th cwSortHeader column="name" label="Name" [(sort)]="sort"></th>
    <th cwSortHeader column="size" label="Size" [(sort)]="sort"></th>
  </tr></thead></table>`,
})
class Host {
  readonly sort = signal<TableSort<'name' | 'size'>>({ column: 'name', direction: 'asc' });
}

describe('SortHeader', () => {
  it('marks the sorted column, flips it on a click and starts another column ascending', async () => {
    const fixture = TestBed.createComponent(Host);
    await fixture.whenStable();
    const [name, size] = Array.from(fixture.nativeElement.querySelectorAll('th')) as HTMLElement[];
    expect(name.getAttribute('scope')).toBe('col');
    expect(name.getAttribute('aria-sort')).toBe('ascending');
    expect(size.getAttribute('aria-sort')).toBe('none');

    name.querySelector('button')!.click();
    await fixture.whenStable();
    expect(fixture.componentInstance.sort()).toEqual({ column: 'name', direction: 'desc' });
    expect(name.getAttribute('aria-sort')).toBe('descending');

    size.querySelector('button')!.click();
    await fixture.whenStable();
    expect(fixture.componentInstance.sort()).toEqual({ column: 'size', direction: 'asc' });
    expect(size.textContent).toContain('arrow_upward');
    expect(name.querySelector('mat-icon')).toBeNull();
  });
});
