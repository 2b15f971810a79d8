import { Op, type Transaction } from 'sequelize';
import { calculatorByName } from '@shared/calc/index';
import type { CalculatorName } from '@shared/calc/names';
import type { CalculationCreateInput, CalculationDTO, CalculationListQuery } from '@shared/schemas/calculation';
import type { UserDTO } from '@shared/schemas/user';
import { AppError } from '../../lib/app-error';
import { assertCanSeeApprentice, canSeeApprentice } from '../classes/access';
import { toCalculationDTO } from './calculation.mapper';
import { Calculation } from './calculation.model';

const WHAT = 'That saved result';

/**
 * Stores a result computed here from the inputs alone: whatever results a client holds are never taken. The inputs
 * are stored as the calculator parsed them (defaults filled in, stray keys dropped), so a reopened result computes
 * the same. Bad inputs throw the calculator's ZodError, which answers 400 with the input names as fields.
 */
export async function saveCalculation(userId: number, input: CalculationCreateInput): Promise<CalculationDTO> {
  const calc = calculatorByName(input.calculator as CalculatorName);
  const output = calc.compute(input.inputs);
  const inputs = calc.inputSchema.parse(input.inputs) as Record<string, unknown>;
  const row = await Calculation.create({
    userId,
    calculator: input.calculator,
    title: input.title ?? calc.title,
    inputs,
    results: output.results,
    warnings: output.warnings,
  });
  return toCalculationDTO(row);
}

/** The viewer's own results, or an apprentice's for a mentor of their class or the guild office. */
export async function listCalculations(viewer: UserDTO, query: CalculationListQuery): Promise<CalculationDTO[]> {
  const ownerId = query.apprentice ?? viewer.id;
  if (ownerId !== viewer.id) await assertCanSeeApprentice(viewer, ownerId, 'That apprentice');
  const rows = await Calculation.findAll({
    where: { userId: ownerId },
    order: [
      ['createdAt', 'DESC'],
      ['id', 'DESC'],
    ],
  });
  return rows.map(toCalculationDTO);
}

async function visibleRow(viewer: UserDTO, id: number): Promise<Calculation | null> {
  const row = id > 0 ? await Calculation.findByPk(id) : null;
  if (!row) return null;
  if (row.userId === viewer.id || (await canSeeApprentice(viewer, row.userId))) return row;
  return null;
}

export async function getCalculation(viewer: UserDTO, id: number): Promise<CalculationDTO> {
  const row = await visibleRow(viewer, id);
  if (!row) throw AppError.notFound(WHAT);
  return toCalculationDTO(row);
}

/** Only the owner deletes; a mentor who may read it is told no, anyone else that it does not exist. */
export async function deleteCalculation(viewer: UserDTO, id: number): Promise<void> {
  const row = await visibleRow(viewer, id);
  if (!row) throw AppError.notFound(WHAT);
  if (row.userId !== viewer.id) throw AppError.forbidden('Only the apprentice who saved a result can delete it.');
  await row.destroy();
}

/**
 * For features that attach saved results to their own records (bench log, submissions): every id must be one of
 * the user's own results. Returns them in the order given; pass the transaction when called inside one (the pool
 * has a single connection). Throws 400 on `field` otherwise.
 */
export async function assertOwnCalculations(
  userId: number,
  ids: readonly number[],
  options: { transaction?: Transaction; field?: string } = {},
): Promise<CalculationDTO[]> {
  const unique = [...new Set(ids)];
  if (unique.length === 0) return [];
  const rows = await Calculation.findAll({
    where: { id: { [Op.in]: unique }, userId },
    transaction: options.transaction,
  });
  if (rows.length !== unique.length) {
    throw AppError.badRequest('Some fields need attention.', {
      [options.field ?? 'calculationIds']: ['Attach only results you saved yourself.'],
    });
  }
  const byId = new Map(rows.map((r) => [r.id, toCalculationDTO(r)]));
  return unique.map((id) => byId.get(id)!);
}
