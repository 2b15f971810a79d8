import type { AcceptInvitationInput, InvitationPreview } from '@shared/schemas/invitation';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { recordAudit } from '../audit/audit.service';
import { hashPassword } from '../auth/passwords';
import { toUserDTO } from '../auth/user.mapper';
import { User } from '../auth/user.model';
import { Course } from '../courses/course.model';
import { Enrolment, GuildClass } from './class.model';
import { Invitation } from './invitation.model';
import { hashLinkToken } from '../../lib/link-token';

/** One answer for unknown, used, revoked and expired links, so a guessed token learns nothing. */
const gone = () =>
  new AppError(
    'INVITATION_GONE',
    'This invitation link has been used, withdrawn or has run out. Ask the guild office for a new one.',
    410,
  );

const TOKEN = /^[A-Za-z0-9_-]{20,100}$/;

async function findUsable(token: string) {
  if (!TOKEN.test(token)) throw gone();
  const invitation = await Invitation.findOne({ where: { tokenHash: hashLinkToken(token) } });
  if (!invitation || invitation.acceptedAt || invitation.revokedAt || invitation.expiresAt <= new Date()) throw gone();
  const cls = await GuildClass.findByPk(invitation.classId);
  if (!cls || cls.archivedAt) throw gone();
  const course = await Course.findByPk(cls.courseId);
  return { invitation, cls, course };
}

export async function previewInvitation(token: string): Promise<InvitationPreview> {
  const { invitation, cls, course } = await findUsable(token);
  return {
    email: invitation.email,
    name: invitation.name,
    className: cls.name,
    courseTitle: course?.title ?? '',
    courseSlug: course?.slug ?? '',
    expiresAt: invitation.expiresAt.toISOString(),
  };
}

/** Creates the apprentice's account and enrolment, and spends the token, all in one transaction. */
export async function acceptInvitation(token: string, input: AcceptInvitationInput): Promise<UserDTO> {
  const { invitation } = await findUsable(token);
  // Hashed before the transaction: bcrypt takes a quarter of a second, which the database should not wait for.
  const passwordHash = await hashPassword(input.password);
  return GuildClass.sequelize!.transaction(async (transaction) => {
    // Spending the token is the first write and is conditional, so two simultaneous accepts cannot both succeed.
    const [spent] = await Invitation.update(
      { acceptedAt: new Date() },
      { where: { id: invitation.id, acceptedAt: null, revokedAt: null }, transaction },
    );
    if (spent !== 1) throw gone();
    if (await User.findOne({ where: { email: invitation.email }, transaction })) {
      throw AppError.conflict(
        'An account with this e-mail address already exists. Sign in, and ask the guild office to enrol you.',
      );
    }
    const user = await User.create(
      { email: invitation.email, name: input.name, role: 'apprentice', passwordHash },
      { transaction },
    );
    await Enrolment.create({ classId: invitation.classId, userId: user.id }, { transaction });
    await recordAudit(
      user.id,
      'invitation.accepted',
      { type: 'invitation', id: invitation.id, label: invitation.email },
      { classId: invitation.classId },
      transaction,
    );
    return toUserDTO(user);
  });
}
