import { useState } from 'react';
import { formatMinutes } from '@shared/schemas/log-entry';
import type { RecordSkill } from '@shared/schemas/record';
import { Button } from '@/components/ui/button';
import { useWithdrawSignOff } from '../api/record-actions';
import { EvidenceList, shortDay } from './evidence-list';
import { ReasonStep } from './reason-step';
import { SignOffDialog } from './sign-off-dialog';
import { SkillStatusBadge } from './skill-status-badge';

interface Props {
  apprentice: { id: number; name: string };
  courseId: number;
  skill: RecordSkill;
  /** The viewer may sign off and withdraw (a mentor of the class or the guild office). */
  signer: { id: number; isOffice: boolean } | null;
}

/** One skill: its standard, status, evidence, time at the bench and sign-off, with the signer's actions. */
export function SkillCard({ apprentice, courseId, skill, signer }: Props) {
  const [signing, setSigning] = useState(false);
  const withdraw = useWithdrawSignOff();
  const mayWithdraw = skill.signOff && signer && (signer.isOffice || signer.id === skill.signOff.by.id);

  return (
    <li className="rounded-lg border border-rule bg-card p-4">
      <div className="flex flex-wrap items-start justify-between gap-3">
        <div className="min-w-0 flex-1">
          <h3 className="font-serif text-lg font-semibold">{skill.label}</h3>
          <p className="max-w-prose text-sm text-muted">{skill.standard}</p>
        </div>
        <SkillStatusBadge status={skill.status} />
      </div>
      <p className="mt-2 text-sm text-muted">
        At the bench on its lessons: <span className="num">{formatMinutes(skill.minutes)}</span>
      </p>
      <div className="mt-3">
        <EvidenceList items={skill.evidence} asMentor={signer !== null} />
      </div>
      {skill.signOff && (
        <p className="mt-3 rounded-md border border-brass/50 bg-brass/5 p-3 text-sm">
          Signed off on {shortDay(skill.signOff.at)} by {skill.signOff.by.name}: “{skill.signOff.note}”
        </p>
      )}
      {skill.withdrawn.map((w) => (
        <p key={w.id} className="mt-2 text-sm text-muted">
          A sign-off by {w.by.name} on {shortDay(w.at)} was withdrawn on {shortDay(w.withdrawnAt)}
          {w.withdrawnBy ? ` by ${w.withdrawnBy.name}` : ''}: {w.reason}
        </p>
      ))}
      {signer && (
        <div className="mt-3 flex flex-wrap justify-end gap-2">
          {skill.status === 'ready' && (
            <Button onClick={() => setSigning(true)} aria-label={`Sign off ${skill.label}`}>
              Sign off
            </Button>
          )}
          {mayWithdraw && (
            <ReasonStep
              label="Withdraw sign-off"
              ariaLabel={`Withdraw the sign-off of ${skill.label}`}
              reasonLabel="Why is it withdrawn?"
              confirmLabel="Withdraw"
              busy={withdraw.isPending}
              error={withdraw.error}
              onConfirm={(reason) => withdraw.mutate({ id: skill.signOff!.id, reason })}
            />
          )}
        </div>
      )}
      {signing && (
        <SignOffDialog apprentice={apprentice} courseId={courseId} skill={skill} onClose={() => setSigning(false)} />
      )}
    </li>
  );
}
