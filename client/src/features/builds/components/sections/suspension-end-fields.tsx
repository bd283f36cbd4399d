import type { Control, FieldErrors, UseFormRegister } from 'react-hook-form';
import { SPRING_TYPES, SUSPENSION_TYPES, type ChassisSection } from '@shared/schemas/build-sections';
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
      <LengthMmField control={control} name={`${end}.bellCrankSpringArmMm`} label="Bell-crank spring arm" />
      <LengthMmField control={control} name={`${end}.bellCrankPushrodArmMm`} label="Bell-crank pushrod arm" />
      <TextInput {...f} name={`${end}.dampers`} label="Dampers" />
      <TextInput {...f} name={`${end}.antiRollBar`} label="Anti-roll bar" />
      <div className="sm:col-span-2">
        <TextInput {...f} name={`${end}.description`} label="Description" />
      </div>
    </FieldGroup>
  );
}

const POINTS = [
  ['upperFront', 'Upper link, front pivot'],
  ['upperRear', 'Upper link, axle pivot'],
  ['lowerFront', 'Lower link, front pivot'],
  ['lowerRear', 'Lower link, axle pivot'],
] as const;

/** Side-view pivot points of the rear four-link (kept in mm, typed in mm or inches): x forward from the axle centre, y up from the ground. */
export function FourLinkFields({ control }: Omit<Props, 'end'>) {
  return (
    <FieldGroup title="Rear four-link (side view)">
      <p className="text-sm text-graphite sm:col-span-2">x: forward from the rear axle centre; y: up from the ground. For anti-squat, with the wheelbase above.</p>
      {POINTS.map(([key, label]) => (
        <div key={key} className="grid grid-cols-2 gap-2 sm:col-span-2">
          <LengthMmField control={control} name={`rear.fourLink.${key}.x`} label={`${label}: x`} />
          <LengthMmField control={control} name={`rear.fourLink.${key}.y`} label={`${label}: y`} />
        </div>
      ))}
      <LengthMmField control={control} name="rear.fourLink.cgHeightMm" label="Centre of gravity height" />
    </FieldGroup>
  );
}
