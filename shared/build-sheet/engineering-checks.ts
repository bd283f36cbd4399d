// Spec checks for the second round of the numbers. Each says why in an owner's words and what to
// check. The windows are common practice, not a standard: they flag a sheet to look at again.
import { convert, figureValueIn, formatNumber, masterTravelPerMmOfPistonTravel, type SpecWarning } from '../calc';
import type { Sections } from '../schemas/build-sections';
import type { FigureInput } from '../schemas/figure';
import { brakeFigures, cgHeightFigures, frontGeometryFigures, quarterMileFigures } from './engineering-figures';

/** Common practice: master cylinder travel for 1 mm at every caliper piston, against a stroke of about 32–38 mm. */
export const MASTER_TRAVEL_WINDOW = { min: 8, max: 38 };
/** Common practice: a claimed ET more than 15 % quicker (or a trap speed 15 % faster) than the estimate is worth a second look. */
export const QUARTER_MILE_MARGIN = 0.15;

const f1 = (n: number) => formatNumber(n, { decimals: 1 });

export function engineeringChecks(sections: Sections, input: { weight?: FigureInput | null; frontWeightPercent?: number; weighIns?: Parameters<typeof cgHeightFigures>[1] }): SpecWarning[] {
  const out: SpecWarning[] = [];
  const warn = (w: SpecWarning) => out.push(w);

  const brakes = brakeFigures(sections.brakes);
  if (brakes.status === 'ok' && input.frontWeightPercent !== undefined) {
    const cg = cgHeightFigures(sections.chassis, input.weighIns);
    const wheelbase = sections.chassis?.wheelbase;
    const stat = input.frontWeightPercent;
    // At 1 g the front axle carries its static share plus h/L of the weight; without h, allow 35 points.
    const lift = cg.status === 'ok' && wheelbase ? (cg.value.cgHeight / figureValueIn('length', wheelbase, 'mm')) * 100 : 35;
    const high = Math.min(95, stat + lift + 10);
    const split = brakes.value.frontPercent;
    if (split < stat || split > high) {
      warn({
        code: 'brake_split_outside_window',
        section: 'brakes',
        field: 'brakes.hydraulics.balanceFrontPercent',
        message: `The front brakes take ${f1(split)} % of the torque; with ${f1(stat)} % of the weight in front, a sensible window is ${f1(stat)}–${f1(high)} %.`,
        why:
          split < stat
            ? 'Less front brake than front weight lets the rear wheels lock first, and a car with locked rear wheels turns round. Check the rear caliper and master cylinder sizes, the balance bar or a proportioning valve.'
            : 'Far more front brake than the weight moving forward under braking leaves the rears doing little, so stops are longer. Check the balance bar, the rear caliper size and any proportioning valve.',
      });
    }
  }
  if (brakes.status === 'ok') {
    const travel = masterTravelPerMmOfPistonTravel({ master: brakes.value.input.master, front: brakes.value.input.front.caliper, rear: brakes.value.input.rear.caliper });
    const field = 'brakes.hydraulics.masterBoreMm';
    if (travel > MASTER_TRAVEL_WINDOW.max) {
      warn({ code: 'master_cylinder_too_small', section: 'brakes', field, message: `The master cylinder must travel ${f1(travel)} mm to move every caliper piston 1 mm.`, why: 'A bore this small for these calipers runs out of stroke: a long, low pedal. Check the master cylinder’s stroke against the caliper piston area, or choose a larger bore.' });
    } else if (travel < MASTER_TRAVEL_WINDOW.min) {
      warn({ code: 'master_cylinder_too_large', section: 'brakes', field, message: `The master cylinder moves every caliper piston 1 mm in only ${f1(travel)} mm of travel.`, why: 'A bore this large for these calipers makes little pressure from the pedal: a hard pedal and a hard push to stop. Check the pedal ratio, a booster, or a smaller bore.' });
    }
  }

  const geo = frontGeometryFigures(sections.chassis);
  if (geo.status === 'ok') {
    const rc = geo.value.centres.rollCentreHeightMm;
    const base = 'chassis.front.geometry';
    if (rc !== null && rc < 0) {
      warn({ code: 'roll_centre_below_ground', section: 'chassis', field: `${base}.lowerInner`, message: `The front roll centre works out ${f1(-rc)} mm below the ground.`, why: 'A roll centre below the ground makes the body roll more and the arms’ angles are often the reason. Check the pivot heights you measured, and the lower arm’s angle at ride height.' });
    }
    const wc = geo.value.wheelCentreHeightMm;
    if (rc !== null && wc !== undefined && rc > wc) {
      warn({ code: 'roll_centre_above_wheel_centre', section: 'chassis', field: `${base}.upperInner`, message: `The front roll centre works out ${f1(rc)} mm high, above the wheel centre (${f1(wc)} mm).`, why: 'A roll centre that high jacks the car up in corners. Check the pivot points, especially the upper arm’s inner pivot.' });
    }
    const gain = geo.value.curve.camberGainPer25MmBumpDeg;
    if (gain !== null && gain > 0.01) {
      warn({ code: 'camber_gain_wrong_sign', section: 'chassis', field: `${base}.upperInner`, message: `In bump the front tyre’s top leans out: +${formatNumber(gain, { decimals: 2 })}° per 25 mm.`, why: 'Most double wishbones are set up so the top of the tyre leans in as the wheel rises, to keep the outside tyre flat in a corner. Check that the upper and lower points are not swapped, and the upper arm’s angle.' });
    }
  }

  const et = sections.drivetrain?.quarterMileEt;
  const q = quarterMileFigures(sections, input.weight);
  if (et !== undefined && q.status === 'ok' && et < q.value.elapsedTimeS * (1 - QUARTER_MILE_MARGIN)) {
    warn({ code: 'quarter_mile_beyond_power', section: 'drivetrain', field: 'drivetrain.quarterMileEt', message: `A ${formatNumber(et, { decimals: 2 })} s quarter mile is far quicker than the ${formatNumber(q.value.elapsedTimeS, { decimals: 2 })} s that the power and weight suggest.`, why: 'Elapsed time follows power to weight closely. Check the power and weight on the sheet, or whether the time slip is from an eighth mile.' });
  }
  const trap = sections.drivetrain?.quarterMileTrap;
  const trapKmh = trap && q.status === 'ok' ? speedKmh(trap) : undefined;
  if (trapKmh !== undefined && q.status === 'ok' && trapKmh > q.value.trapSpeedKmh * (1 + QUARTER_MILE_MARGIN)) {
    const mph = (kmh: number) => formatNumber(convert('speed', kmh, 'km/h', 'mph'), { decimals: 0 });
    warn({ code: 'quarter_mile_trap_beyond_power', section: 'drivetrain', field: 'drivetrain.quarterMileTrap', message: `A trap speed of ${mph(trapKmh)} mph is far above the ${mph(q.value.trapSpeedKmh)} mph that the power and weight suggest.`, why: 'Trap speed follows power to weight even more closely than elapsed time does, because launch and traction matter less to it. Check the power and weight on the sheet, and the unit of the trap speed (mph or km/h).' });
  }
  return out;
}

function speedKmh(f: FigureInput): number | undefined {
  try {
    const v = figureValueIn('speed', f, 'km/h');
    return Number.isFinite(v) ? v : undefined;
  } catch {
    return undefined;
  }
}
