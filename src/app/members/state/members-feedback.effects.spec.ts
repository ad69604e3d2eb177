import { Actions } from '@ngrx/effects';
import { Action } from '@ngrx/store';
import { firstValueFrom, of } from 'rxjs';
import { Notifier } from '@app/core/notifier';
import { generateMockMember } from '@app/testing/member-mock';
import { MembersApiActions } from './members-api.actions';
import { MembersPageActions } from './members-page.actions';
import { showFailure, showSuccess } from './members-feedback.effects';

const actionsOf = (...actions: Action[]) => new Actions(of(...actions));
const fakeNotifier = () => ({ notify: jest.fn() }) as unknown as Notifier;

describe('members feedback effects', () => {
  it('showFailure shows the refusal to the admin', async () => {
    const notifier = fakeNotifier();

    await firstValueFrom(
      showFailure(actionsOf(MembersApiActions.memberUpdatedFailure({ memberId: 22, message: 'Last admin.' })), notifier),
    );

    expect(notifier.notify).toHaveBeenCalledWith('Last admin.', 6000);
  });

  it('showSuccess names the member whose change was saved', async () => {
    const notifier = fakeNotifier();

    await firstValueFrom(showSuccess(actionsOf(MembersApiActions.memberUpdatedSuccess({ member: generateMockMember() })), notifier));

    expect(notifier.notify).toHaveBeenCalledWith('Saved the changes to Jonah Weiss.', 6000);
  });

  it('showSuccess asks for a manual copy when the clipboard refused the link', async () => {
    const notifier = fakeNotifier();

    await firstValueFrom(showSuccess(actionsOf(MembersPageActions.issuedLinkCopied({ copied: false })), notifier));

    expect(notifier.notify).toHaveBeenCalledWith(expect.stringContaining('copy it by hand'), 6000);
  });
});
