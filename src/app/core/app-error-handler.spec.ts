import { TestBed } from '@angular/core/testing';
import { AppErrorHandler } from './app-error-handler';
import { Notifier } from './notifier';

describe('AppErrorHandler', () => {
  it('logs an unhandled error and tells the person through the notifier', () => {
    const notify = jest.fn();
    TestBed.configureTestingModule({ providers: [AppErrorHandler, { provide: Notifier, useValue: { notify } }] });
    const log = jest.spyOn(console, 'error').mockImplementation(() => undefined);
    const error = new Error('unexpected');

    TestBed.inject(AppErrorHandler).handleError(error);

    expect(log).toHaveBeenCalledWith(error);
    expect(notify).toHaveBeenCalledWith(expect.stringContaining('Something went wrong'), 8000);
    log.mockRestore();
  });
});
