import { ComponentFixture, TestBed } from '@angular/core/testing';
import { PayDuesRequest, TEST_CARDS } from '@shared/dues';
import { generateMockPlan } from '@app/testing/dues-mock';
import { PayDuesForm } from './pay-dues-form';

describe('PayDuesForm', () => {
  let fixture: ComponentFixture<PayDuesForm>;
  let element: HTMLElement;
  let emitted: PayDuesRequest[];

  beforeEach(async () => {
    fixture = TestBed.createComponent(PayDuesForm);
    fixture.componentRef.setInput('plans', [generateMockPlan(), generateMockPlan({ id: 2, name: 'Supporter', amountCents: 2500 })]);
    fixture.componentRef.setInput('testMode', true);
    fixture.componentRef.setInput('testCards', TEST_CARDS);
    element = fixture.nativeElement as HTMLElement;
    emitted = [];
    fixture.componentInstance.paymentSubmitted.subscribe((request) => emitted.push(request));
    await fixture.whenStable();
  });

  const radio = (text: string) => [...element.querySelectorAll<HTMLInputElement>('input[type="radio"]')].find((input) => input.closest('mat-radio-button')?.textContent?.includes(text))!;
  const pay = async () => {
    [...element.querySelectorAll('button')].find((b) => b.textContent?.includes('Pay dues'))!.click();
    await fixture.whenStable();
  };

  it('says plainly that it is a test mode and offers the test cards, with no card number field', () => {
    expect(element.textContent).toContain('Test mode');
    expect(element.textContent).toContain('Test Visa ending 4242');
    expect(element.querySelector('input[type="text"], input[inputmode="numeric"]')).toBeNull();
  });

  it('emits the chosen plan and card token with an idempotency key', async () => {
    radio('Supporter').click();
    radio('Test Visa').click();

    await pay();

    expect(emitted).toEqual([{ planId: 2, cardToken: 'tok_visa', saveCardForRenewal: false, idempotencyKey: expect.stringMatching(/^[0-9a-f]{32}$/) }]);
  });

  it('sends a resend of the same attempt with the same key, and a new attempt after a successful payment with a new one', async () => {
    radio('Test Visa').click();
    await pay();
    await pay();
    fixture.componentRef.setInput('paymentsMade', 1);
    await fixture.whenStable();
    radio('Test Visa').click();
    await pay();

    expect(emitted[1].idempotencyKey).toBe(emitted[0].idempotencyKey);
    expect(emitted[2].idempotencyKey).not.toBe(emitted[0].idempotencyKey);
  });

  it('asks for a card and emits nothing when none is chosen', async () => {
    await pay();

    expect(emitted).toEqual([]);
    expect(element.textContent).toContain('Choose a card.');
  });
});
