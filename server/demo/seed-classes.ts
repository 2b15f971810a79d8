import type { Sequelize } from 'sequelize';
import type { AuditAction } from '@shared/schemas/audit';
import { AuditEvent } from '../features/audit/audit-event.model';
import { User } from '../features/auth/user.model';
import { ClassMentor, GuildClass } from '../features/classes/class.model';
import { Invitation } from '../features/classes/invitation.model';
import { newInvitationToken } from '../features/classes/invitation-token';
import { DEMO_CLASSES, DEMO_PEOPLE, demoEmail } from './people';

const DAY_MS = 24 * 3600 * 1000;

/** Invented invitees who have not accepted yet, so the guild office has pending invitations to show. */
const PENDING = [
  { name: 'Isolde Penwarden', key: 'isolde', cls: 'spring' },
  { name: 'Tobias Carrow', key: 'tobias', cls: 'spring' },
] as const;

/**
 * The guild office's history behind the demo classes: their creation, mentors and a few open invitations.
 * Idempotent: invitations are found by class and address, audit events by action and target.
 */
export async function seedClasses(sequelize: Sequelize): Promise<void> {
  await sequelize.transaction(async (transaction) => {
    const office = await User.findOne({ where: { email: demoEmail('office') }, transaction });
    if (!office) return;
    const once = async (
      action: AuditAction,
      type: 'class' | 'invitation',
      id: number,
      details: Record<string, unknown>,
      at: Date,
    ) => {
      const found = await AuditEvent.findOne({ where: { action, targetType: type, targetId: id }, transaction });
      if (!found)
        await AuditEvent.create(
          { actorId: office.id, action, targetType: type, targetId: id, details, createdAt: at },
          { transaction },
        );
    };

    for (const [key, spec] of Object.entries(DEMO_CLASSES)) {
      const cls = await GuildClass.findOne({ where: { name: spec.name }, transaction });
      if (!cls) continue;
      // Dated as an office would set a class up, a few weeks before it starts, but never in the future.
      const fourWeeksBefore = new Date(`${spec.startsOn}T09:00:00Z`).getTime() - 28 * DAY_MS;
      const setUp = new Date(Math.min(fourWeeksBefore, Date.now() - DAY_MS));
      const { name, startsOn, endsOn, capacity } = spec;
      await once(
        'class.created',
        'class',
        cls.id,
        { label: name, name, courseId: cls.courseId, startsOn, endsOn, capacity },
        setUp,
      );
      const mentorIds = (await ClassMentor.findAll({ where: { classId: cls.id }, transaction })).map((m) => m.userId);
      const mentorNames = DEMO_PEOPLE.filter((p) => p.role === 'mentor' && p.cls === key).map((p) => p.name);
      if (mentorIds.length)
        await once('class.mentors-changed', 'class', cls.id, { label: name, added: mentorNames, removed: [] }, setUp);

      for (const invitee of PENDING.filter((p) => p.cls === key)) {
        const email = demoEmail(invitee.key);
        let invitation = await Invitation.findOne({ where: { classId: cls.id, email }, transaction });
        if (!invitation) {
          const { tokenHash, expiresAt } = newInvitationToken();
          invitation = await Invitation.create(
            { classId: cls.id, email, name: invitee.name, tokenHash, expiresAt, invitedById: office.id },
            { transaction },
          );
        }
        await once(
          'invitation.sent',
          'invitation',
          invitation.id,
          { label: email, classId: cls.id, className: name, source: 'e-mail' },
          new Date(),
        );
      }
    }
  });
}
