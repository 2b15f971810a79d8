import { Op, fn, col, type Transaction } from 'sequelize';
import type { ClassCounts } from '@shared/schemas/class';
import { Enrolment, type GuildClass } from './class.model';
import { Invitation } from './invitation.model';

type Tally = Omit<ClassCounts, 'seatsLeft'>;

/** Where an invitation still holds a seat: sent, and not yet accepted, revoked or expired. */
export const pendingInvitation = (now = new Date()) => ({
  acceptedAt: null,
  revokedAt: null,
  expiresAt: { [Op.gt]: now },
});

/** Enrolments by status and open invitations, per class, in two grouped queries. */
export async function tallyClasses(classIds: number[], transaction?: Transaction): Promise<Map<number, Tally>> {
  const tallies = new Map<number, Tally>(classIds.map((id) => [id, { active: 0, withdrawn: 0, invited: 0 }]));
  if (classIds.length === 0) return tallies;
  const enrolled = (await Enrolment.findAll({
    attributes: ['classId', 'status', [fn('COUNT', col('id')), 'n']],
    where: { classId: { [Op.in]: classIds } },
    group: ['classId', 'status'],
    raw: true,
    transaction,
  })) as unknown as { classId: number; status: string; n: number }[];
  for (const row of enrolled) {
    const tally = tallies.get(row.classId)!;
    if (row.status === 'active') tally.active = Number(row.n);
    else if (row.status === 'withdrawn') tally.withdrawn = Number(row.n);
  }
  const invited = (await Invitation.findAll({
    attributes: ['classId', [fn('COUNT', col('id')), 'n']],
    where: { classId: { [Op.in]: classIds }, ...pendingInvitation() },
    group: ['classId'],
    raw: true,
    transaction,
  })) as unknown as { classId: number; n: number }[];
  for (const row of invited) tallies.get(row.classId)!.invited = Number(row.n);
  return tallies;
}

export const seatsLeft = (cls: Pick<GuildClass, 'capacity'>, tally: Tally) =>
  Math.max(0, cls.capacity - tally.active - tally.invited);
