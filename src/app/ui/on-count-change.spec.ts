import { Injector, runInInjectionContext, signal } from '@angular/core';
import { TestBed } from '@angular/core/testing';
import { onCountChange } from './on-count-change';

describe('onCountChange', () => {
  it('acts once per change of the count and not while it stays the same', () => {
    const count = signal(0);
    const other = signal('typed');
    let acted = 0;
    runInInjectionContext(TestBed.inject(Injector), () =>
      onCountChange(count, () => {
        other();
        acted += 1;
      }),
    );
    TestBed.tick();
    expect(acted).toBe(0);

    count.set(1);
    TestBed.tick();
    other.set('typed again');
    TestBed.tick();
    expect(acted).toBe(1);

    count.set(2);
    TestBed.tick();
    expect(acted).toBe(2);
  });
});
