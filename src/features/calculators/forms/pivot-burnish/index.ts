import { FRICTION_TABLE, pivotBurnish, SURFACE_SPEED_TABLE } from '@shared/calc/pivot-burnish';
import { defineForm } from '../../lib/define-form';
import { num, type Draft } from '../../lib/draft';
import { fromTable, rowOf } from './table-choice';
import { PivotInputs } from './pivot-inputs';
import { PivotResults } from './pivot-results';

const MU = FRICTION_TABLE.map((r) => r.mu);
const SPEED = SURFACE_SPEED_TABLE.map((r) => r.mPerMin);

const initial: Draft = {
  loadN: '1.42',
  leverArmMm: '0.75',
  pivotDiameterMm: '1',
  bearingLengthMm: '1.5',
  pivotLengthMm: '',
  allowableStressMPa: '200',
  friction: rowOf(0.19, MU),
  frictionCoefficient: '0.19',
  speed: String(SURFACE_SPEED_TABLE.length - 1),
  surfaceSpeedMPerMin: '15',
};

export const pivotBurnishForm = defineForm({
  calculator: pivotBurnish,
  // The pivots lesson's third arbor of the class regulator: at most 1.42 N from a 3 kg weight through the train, on a
  // 1.0 mm pivot with 1.5 mm in the hole, a = 0.75 mm, σ_allow = 200 MPa (common practice, no source).
  initial,
  toInput: (d) => ({
    loadN: num(d.loadN) as number,
    leverArmMm: num(d.leverArmMm) as number,
    pivotDiameterMm: num(d.pivotDiameterMm) as number,
    bearingLengthMm: num(d.bearingLengthMm),
    pivotLengthMm: num(d.pivotLengthMm),
    allowableStressMPa: num(d.allowableStressMPa),
    frictionCoefficient: fromTable(d.friction, d.frictionCoefficient, MU),
    surfaceSpeedMPerMin: fromTable(d.speed, d.surfaceSpeedMPerMin, SPEED),
  }),
  fromInput: (input) => ({
    loadN: String(input.loadN),
    leverArmMm: String(input.leverArmMm),
    pivotDiameterMm: String(input.pivotDiameterMm),
    bearingLengthMm: input.bearingLengthMm === undefined ? '' : String(input.bearingLengthMm),
    pivotLengthMm: input.pivotLengthMm === undefined ? '' : String(input.pivotLengthMm),
    allowableStressMPa: String(input.allowableStressMPa),
    friction: rowOf(input.frictionCoefficient, MU),
    frictionCoefficient: String(input.frictionCoefficient),
    speed: rowOf(input.surfaceSpeedMPerMin, SPEED),
    surfaceSpeedMPerMin: String(input.surfaceSpeedMPerMin),
  }),
  Inputs: PivotInputs,
  Results: PivotResults,
});
