import { Op, type Transaction } from 'sequelize';
import { Email } from '@shared/schemas/user';
import type { InviteOutcome } from '@shared/schemas/invitation';
import { User } from '../auth/user.model';
import { seatsLeft, tallyClasses } from './class-counts';
import { Enrolment, type GuildClass } from './class.model';
import { Invitation } from './invitation.model';

export interface Invitee {
  email: string;
  name: string | null;
}

export interface Plan extends Invitee {
  outcome: InviteOutcome;
  user?: User;
  enrolment?: Enrolment;
  /** An earlier invitation to the same address that has run out; it is renewed rather than duplicated. */
  expired?: Invitation;
}

export const isSuccess = (o: InviteOutcome) => o === 'enrolled' || o === 'invited';

/**
 * Decides, address by address and in order, what inviting would do. The preview of a roster file and the actual
 * invitations use the same decision, so what the admin sees before importing is what happens.
 */
export async function planInvites(cls: GuildClass, invitees: Invitee[], transaction?: Transaction): Promise<Plan[]> {
  const parsed = invitees.map((i) => ({ ...i, valid: Email.safeParse(i.email) }));
  const emails = [...new Set(parsed.flatMap((p) => (p.valid.success ? [p.valid.data] : [])))];
  const [users, invitations, tally] = await Promise.all([
    User.findAll({ where: { email: { [Op.in]: emails } }, transaction }),
    Invitation.findAll({
      where: { classId: cls.id, email: { [Op.in]: emails }, acceptedAt: null, revokedAt: null },
      transaction,
    }),
    tallyClasses([cls.id], transaction).then((m) => m.get(cls.id)!),
  ]);
  const enrolments = await Enrolment.findAll({
    where: { classId: cls.id, userId: { [Op.in]: users.map((u) => u.id) } },
    transaction,
  });
  const userByEmail = new Map(users.map((u) => [u.email, u]));
  const enrolmentByUser = new Map(enrolments.map((e) => [e.userId, e]));
  const now = new Date();

  let seats = seatsLeft(cls, tally);
  const seen = new Set<string>();
  return parsed.map((p): Plan => {
    const name = p.name?.trim() || null;
    if (!p.valid.success) return { email: p.email.trim(), name, outcome: 'bad-address' };
    const email = p.valid.data;
    const plan = (outcome: InviteOutcome, extra: Partial<Plan> = {}): Plan => ({ email, name, outcome, ...extra });
    if (seen.has(email)) return plan('duplicate');
    seen.add(email);

    const user = userByEmail.get(email);
    if (user) {
      const enrolment = enrolmentByUser.get(user.id);
      if (enrolment?.status === 'active') return plan('already-enrolled');
      if (user.role !== 'apprentice') return plan('not-an-apprentice');
      if (!user.active) return plan('account-inactive');
      if (seats === 0) return plan('class-full');
      seats -= 1;
      return plan('enrolled', { user, enrolment });
    }
    const open = invitations.filter((i) => i.email === email);
    if (open.some((i) => i.expiresAt > now)) return plan('already-invited');
    if (seats === 0) return plan('class-full');
    seats -= 1;
    return plan('invited', { expired: open[0] });
  });
}

const MESSAGES: Record<InviteOutcome, [done: string, planned: string]> = {
  enrolled: ['Has an account: enrolled and told by e-mail.', 'Has an account: will be enrolled and told by e-mail.'],
  invited: ['Invitation sent.', 'Will be sent an invitation.'],
  'bad-address': ['Not a valid e-mail address.', 'Not a valid e-mail address.'],
  duplicate: ['Listed more than once; invited once.', 'Duplicate: this address is listed earlier.'],
  'already-enrolled': ['Already enrolled in this class.', 'Already enrolled in this class.'],
  'already-invited': [
    'Already invited; resend from the pending invitations if needed.',
    'Already invited and not yet accepted.',
  ],
  'class-full': ['The class is full.', 'The class would be full.'],
  'not-an-apprentice': ['This account belongs to a mentor or admin.', 'This account belongs to a mentor or admin.'],
  'account-inactive': [
    'This account is deactivated; reactivate it first.',
    'This account is deactivated; reactivate it first.',
  ],
};

export const outcomeMessage = (outcome: InviteOutcome, planned = false) => MESSAGES[outcome][planned ? 1 : 0];
