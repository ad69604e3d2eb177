import { Role } from '@shared/auth';
import { Invitation, Member } from '@shared/members';
import { ConfirmQuestion } from '@app/ui/confirm-dialog/confirm-dialog';

const WHAT_A_ROLE_GIVES: Record<Role, string> = {
  member: 'design recipes, book kit and brew',
  brewer: 'run lab analyses, sign off strengths and manage the stock',
  admin: 'manage members, dues, the kit register and the brew plan',
};

/** The question before a role change, or null when the change only adds roles. */
export function rolesChangeQuestion(member: Member, roles: readonly Role[], currentUserId: number | null): ConfirmQuestion | null {
  const removed = member.roles.filter((role) => !roles.includes(role));
  if (removed.length === 0) return null;
  const names = removed.join(' and ');
  if (member.id === currentUserId) {
    const losesAdmin = removed.includes('admin');
    return {
      title: `Remove your own ${names} role?`,
      message: losesAdmin
        ? 'You will lose access to the Members page and every officer task at once, and you cannot give the role back to yourself: only another admin can.'
        : `You will no longer be able to ${removed.map((role) => WHAT_A_ROLE_GIVES[role]).join(', or ')}.`,
      confirmLabel: `Remove my ${names} role`,
      lockout: losesAdmin,
    };
  }
  return {
    title: `Remove the ${names} role from ${member.name}?`,
    message: `${member.name} will no longer be able to ${removed.map((role) => WHAT_A_ROLE_GIVES[role]).join(', or ')}.`,
    confirmLabel: `Remove ${names}`,
  };
}

/** The question before a deactivation, or null for a reactivation. */
export function activeChangeQuestion(member: Member, active: boolean, currentUserId: number | null): ConfirmQuestion | null {
  if (active) return null;
  if (member.id === currentUserId) {
    return {
      title: 'Deactivate your own account?',
      message: 'You will be signed out at once and cannot sign in again until another admin reactivates you.',
      confirmLabel: 'Deactivate me',
      lockout: true,
    };
  }
  return {
    title: `Deactivate ${member.name}?`,
    message: `${member.name} is signed out everywhere and cannot sign in until an admin reactivates the account. Their recipes and records stay.`,
    confirmLabel: 'Deactivate',
  };
}

/** The question before revoking an invitation, which cannot be undone. */
export function revocationQuestion(invitation: Invitation | undefined): ConfirmQuestion {
  const who = invitation ? ` for ${invitation.email}` : '';
  return {
    title: `Revoke the invitation${who}?`,
    message: 'The link stops working at once. This cannot be undone: to invite the person again, send a new invitation.',
    confirmLabel: 'Revoke',
  };
}
