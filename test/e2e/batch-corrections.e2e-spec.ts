import { DateTime } from 'luxon';
import { createUser } from '../integration/helpers/user-factory';
import { seedFermentedBatch } from './helpers/batch-strength-seed';
import { newPage, seriousA11yViolations } from './helpers/browser';
import { useE2eEnvironment } from './helpers/e2e-environment';
import { signInPage } from './helpers/pages';
import { dismissSnackBar } from './helpers/recipes-pages';

describe('Correcting a batch and its readings in the browser', () => {
  const env = useE2eEnvironment();

  it("when the brewer edits the batch's details, records a move that happened earlier and corrects a reading's temperature, then each is stored, the value as read unchanged", async () => {
    const brewer = await createUser(env.server.db, ['member'], { name: 'Owner Test' });
    const { batchId } = await seedFermentedBatch(env.server.db, brewer.id);
    const { context, page } = await newPage(env.browser, env.server.baseUrl);
    await signInPage.signIn(page, brewer.email, brewer.password);
    await page.waitForURL(/\/today/);

    await page.goto(`/batches/${batchId}`);
    await page.getByRole('button', { name: 'Edit details' }).click();
    const details = page.getByRole('form', { name: 'Batch details' });
    // Dates are shown as yyyy-MM-dd app-wide, never as a locale's 11/10/2026.
    expect(await details.getByLabel('Brew day').inputValue()).toMatch(/^\d{4}-\d{2}-\d{2}$/);
    await details.getByLabel('Planned volume').fill('23');
    await details.getByLabel('Batch name').fill('Renamed ale');
    expect(await seriousA11yViolations(page)).toEqual([]);
    await details.getByRole('button', { name: 'Save details' }).click();
    await page.getByRole('heading', { level: 1, name: 'Renamed ale' }).waitFor();
    await dismissSnackBar(page);
    expect(await page.getByText('Planned: 23 L').count()).toBe(1);
    expect(await env.server.db('batches').where({ id: batchId }).first()).toMatchObject({ name: 'Renamed ale', planned_volume_litres: '23.00' });

    await page.getByRole('checkbox', { name: 'It happened earlier' }).check();
    // 2026-11-26 read as the 26th of November; a US-style 11/26/2026 is refused as ambiguous.
    await page.getByLabel('Date of the move').fill('11/26/2026');
    await page.getByLabel('Date of the move').blur();
    await page.getByText('Choose the date (yyyy-MM-dd).').waitFor();
    await page.getByLabel('Date of the move').fill('2026-11-26');
    await page.getByLabel('Time of the move').fill('09:15');
    await page.getByLabel('Time of the move').blur();
    expect(await page.getByLabel('Date of the move').inputValue()).toBe('2026-11-26');
    await page.getByRole('button', { name: 'Move to conditioning' }).click();
    await page.locator('mat-snack-bar-container').getByText(/is now conditioning/).waitFor();
    await dismissSnackBar(page);
    const moved = (await env.server.db('batches').where({ id: batchId }).first())!;
    // 09:15 on 26 Nov on the co-op's clocks, whatever zone the server is set to.
    const zone: string = await page.evaluate(async () => (await (await fetch('/api/auth/session')).json()).coopTimeZone);
    expect(moved.status).toBe('conditioning');
    expect(moved.conditioning_at!.toISOString()).toBe(DateTime.fromObject({ year: 2026, month: 11, day: 26, hour: 9, minute: 15 }, { zone }).toUTC().toISO());

    await page.goto(`/gravity-log/${batchId}`);
    // The reading form's hints (the co-op's zone under the time) stay clear of the labels of the row below.
    await page.getByRole('form', { name: 'Log a reading' }).locator('mat-hint').first().waitFor();
    const overlaps = await page.evaluate(() => {
      const form = document.querySelector('form[aria-label="Log a reading"]')!;
      const [hints, labels] = ['mat-hint', 'mat-label'].map((selector) => [...form.querySelectorAll(selector)].map((el) => ({ text: el.textContent!.trim(), box: el.getBoundingClientRect() })));
      return hints.flatMap((hint) =>
        labels.filter(({ box }) => box.width > 0 && box.left < hint.box.right && hint.box.left < box.right && box.top < hint.box.bottom && hint.box.top < box.bottom).map((label) => `${hint.text} over ${label.text}`),
      );
    });
    expect(overlaps).toEqual([]);
    const before = (await env.server.db('gravity_readings').where({ batch_id: batchId }).orderBy('measured_at', 'desc').first())!;
    await page.getByRole('button', { name: /^Correct the reading of/ }).first().click();
    const dialog = page.getByRole('dialog', { name: 'Correct the reading' });
    await dialog.getByLabel('Sample temperature').fill('25');
    await dialog.getByRole('button', { name: 'Save correction' }).click();
    await page.locator('mat-snack-bar-container').getByText('Reading corrected: SG').waitFor();
    const after = (await env.server.db('gravity_readings').where({ id: before.id }).first())!;
    expect(after.raw_value).toBe(before.raw_value);
    expect(Number(after.sample_temperature_c)).toBe(25);
    expect(await env.server.db('audit_log').where({ subject_type: 'batch', subject_id: batchId }).whereIn('action', ['batch-updated', 'reading-edited'])).toHaveLength(2);
    await context.close();
  }, 150_000);
});
