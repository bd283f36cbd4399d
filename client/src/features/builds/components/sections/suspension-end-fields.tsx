import type { Control, FieldErrors, UseFormRegister } from 'react-hook-form';
import { FOUR_LINK_POINTS, FRONT_PIVOTS, MM_RANGES, type FrontPivot, SPRING_TYPES, SUSPENSION_TYPES, type ChassisSection, type FourLinkPoint } from '@shared/schemas/build-sections';
import { SPRING_LABELS, SUSPENSION_LABELS } from '@shared/build-sheet/choice-labels';
import { Choice, FigureField, NumberField, TextInput } from '../editor/fields';
import { FieldGroup } from '../editor/section-form';
import { LengthMmField } from '../editor/length-mm-field';

type Props = { end: 'front' | 'rear'; register: UseFormRegister<ChassisSection>; errors: FieldErrors<ChassisSection>; control: Control<ChassisSection> };

export function SuspensionEndFields({ end, register, errors, control }: Props) {
  const f = { register, errors, form: 'chassis' as const };
  return (
    <FieldGroup title={end === 'front' ? 'Front suspension' : 'Rear suspension'}>
      <Choice {...f} name={`${end}.type`} label="Type" options={SUSPENSION_TYPES} labels={SUSPENSION_LABELS} />
      <Choice {...f} name={`${end}.springType`} label="Springs" options={SPRING_TYPES} labels={SPRING_LABELS} />
      <FigureField control={control} form="chassis" name={`${end}.springRate`} label="Spring rate" kind="springRate" />
      <NumberField {...f} name={`${end}.motionRatio`} label="Motion ratio" hint="Spring travel ÷ wheel travel (with a bell-crank: the pushrod’s)." />
      <NumberField {...f} name={`${end}.springAngleDeg`} label="Spring angle (degrees from the line of wheel travel)" />
      <FigureField control={control} form="chassis" name={`${end}.cornerSprungMass`} label="Sprung mass on one corner" kind="mass" />
      <LengthMmField control={control} name={`${end}.bellCrankSpringArmMm`} range={MM_RANGES.bellCrankSpringArm} />
      <LengthMmField control={control} name={`${end}.bellCrankPushrodArmMm`} range={MM_RANGES.bellCrankPushrodArm} />
      <TextInput {...f} name={`${end}.dampers`} label="Dampers" />
      <TextInput {...f} name={`${end}.antiRollBar`} label="Anti-roll bar" />
      <div className="sm:col-span-2">
        <TextInput {...f} name={`${end}.description`} label="Description" />
      </div>
    </FieldGroup>
  );
}

/** Side-view pivot points of the rear four-link (kept in mm, typed in mm or inches): x forward from the axle centre, y up from the ground. */
export function FourLinkFields({ control }: Omit<Props, 'end'>) {
  return (
    <FieldGroup title="Rear four-link (side view)">
      <p className="text-sm text-graphite sm:col-span-2">x: forward from the rear axle centre; y: up from the ground. For anti-squat, with the wheelbase above.</p>
      {(Object.keys(FOUR_LINK_POINTS) as FourLinkPoint[]).map((point) => (
        <div key={point} className="grid grid-cols-2 gap-2 sm:col-span-2">
          <LengthMmField control={control} name={`rear.fourLink.${point}.x`} range={MM_RANGES.linkX(point)} />
          <LengthMmField control={control} name={`rear.fourLink.${point}.y`} range={MM_RANGES.linkY(point)} />
        </div>
      ))}
      <LengthMmField control={control} name="rear.fourLink.cgHeightMm" range={MM_RANGES.cgHeight} />
    </FieldGroup>
  );
}

/** Front view of the front double wishbone (kept in mm): x outward from the centreline, y up from the ground. */
export function FrontGeometryFields({ control }: Omit<Props, 'end'>) {
  return (
    <FieldGroup title="Front double wishbone (front view)">
      <p className="text-sm text-graphite sm:col-span-2">x: outward from the car’s centreline; y: up from the ground, at ride height. For the roll centre and camber curve.</p>
      {(Object.keys(FRONT_PIVOTS) as FrontPivot[]).map((point) => (
        <div key={point} className="grid grid-cols-2 gap-2 sm:col-span-2">
          <LengthMmField control={control} name={`front.geometry.${point}.x`} range={MM_RANGES.pivotX(point)} />
          <LengthMmField control={control} name={`front.geometry.${point}.y`} range={MM_RANGES.pivotY(point)} />
        </div>
      ))}
      <LengthMmField control={control} name="front.geometry.contactPatchXMm" range={MM_RANGES.contactPatchX} />
      <LengthMmField control={control} name="front.geometry.wheelCentreHeightMm" range={MM_RANGES.wheelCentreHeight} />
    </FieldGroup>
  );
}

/** A tilt weigh-in kept with the chassis by an earlier version; new ones are a weigh-in's tilted reading. */
export function CgTiltFields({ register, errors, control }: Omit<Props, 'end'>) {
  const f = { register, errors, form: 'chassis' as const };
  return (
    <FieldGroup title="Tilt weigh-in kept with the chassis (centre-of-gravity height)">
      <p className="text-sm text-graphite sm:col-span-2">A newer weigh-in with a tilted reading (Weigh-ins) takes the place of these figures.</p>
      <Choice {...f} name="cgTilt.raisedAxle" label="Axle raised" options={['front', 'rear']} labels={{ front: 'Front', rear: 'Rear' }} />
      <Choice {...f} name="cgTilt.unit" label="Weights in" options={['kg', 'lb']} labels={{ kg: 'kg', lb: 'lb' }} />
      <NumberField {...f} name="cgTilt.totalWeight" label="Total weight" />
      <NumberField {...f} name="cgTilt.lowerAxleLevel" label="Axle on the scales, car level" />
      <NumberField {...f} name="cgTilt.lowerAxleRaised" label="Axle on the scales, other axle raised" />
      <LengthMmField control={control} name="cgTilt.raisedHeightMm" range={MM_RANGES.tiltRaise} />
      <LengthMmField control={control} name="cgTilt.wheelCentreHeightMm" range={MM_RANGES.wheelCentreHeight} />
    </FieldGroup>
  );
}
