import { useFieldArray, useWatch, type Control, type FieldErrors, type UseFormRegister } from 'react-hook-form';
import type { ChassisSection } from '@shared/schemas/build-sections';
import { Button } from '@client/components/ui/button';
import { SelectField } from '@client/components/ui/select-field';
import { TextField } from '@client/components/ui/text-field';
import { errorAt, FigureField } from '../editor/fields';

type Props = { register: UseFormRegister<ChassisSection>; errors: FieldErrors<ChassisSection>; control: Control<ChassisSection> };

function TubeRow({ index, register, errors, control, onRemove }: Props & { index: number; onRemove: () => void }) {
  const shape = useWatch({ control, name: `tubes.${index}.shape` });
  return (
    <li className="grid gap-3 border border-rule p-3 sm:grid-cols-2">
      <TextField label="Used for" placeholder="e.g. main rails" {...register(`tubes.${index}.use`)} error={errorAt(errors, `tubes.${index}.use`)} />
      <SelectField label="Shape" options={[{ value: 'round', label: 'Round' }, { value: 'rectangular', label: 'Rectangular' }]} {...register(`tubes.${index}.shape`)} error={errorAt(errors, `tubes.${index}.shape`)} />
      <TextField label="Material" placeholder="e.g. mild steel" {...register(`tubes.${index}.material`)} error={errorAt(errors, `tubes.${index}.material`)} />
      <FigureField control={control} form="chassis" name={`tubes.${index}.outside`} label={shape === 'rectangular' ? 'Width' : 'Outside diameter'} kind="length" />
      {shape === 'rectangular' ? <FigureField control={control} form="chassis" name={`tubes.${index}.height`} label="Height" kind="length" /> : null}
      <FigureField control={control} form="chassis" name={`tubes.${index}.wall`} label="Wall" kind="length" />
      <Button type="button" variant="quiet" className="self-end justify-self-start" onClick={onRemove}>
        Remove this tube
      </Button>
    </li>
  );
}

/** Frame and cage tubing, one line per size. */
export function TubesFields({ register, errors, control }: Props) {
  const { fields, append, remove } = useFieldArray({ control, name: 'tubes' });
  return (
    <fieldset className="flex flex-col gap-2">
      <legend className="mb-1 text-sm font-semibold">Tubes</legend>
      {fields.length === 0 ? <p className="text-sm text-graphite">No tube lines: add the rails, cross-members or cage tubing of a custom frame.</p> : null}
      <ol className="flex flex-col gap-3">
        {fields.map((field, index) => (
          <TubeRow key={field.id} index={index} register={register} errors={errors} control={control} onRemove={() => remove(index)} />
        ))}
      </ol>
      {fields.length < 12 ? (
        <Button type="button" variant="secondary" className="self-start" onClick={() => append({ use: '', shape: 'round', material: '' } as never)}>
          Add a tube
        </Button>
      ) : null}
    </fieldset>
  );
}
