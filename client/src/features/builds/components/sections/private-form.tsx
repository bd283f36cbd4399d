import { BuildPrivateSchema, type BuildPrivate, type OwnerBuild } from '@shared/schemas/build';
import { TextAreaField } from '@client/components/ui/text-area-field';
import { TextField } from '@client/components/ui/text-field';
import { useSavePrivate } from '../../api/save-private';
import { useEditorForm } from '../editor/use-editor-form';
import { SectionForm } from '../editor/section-form';
import { errorAt } from '../editor/fields';

// Absent when the policy keeps them from this viewer: the boxes start empty.
const fromBuild = (b: OwnerBuild): Required<BuildPrivate> => ({ vin: b.private?.vin ?? '', plate: b.private?.plate ?? '', ownerPhone: b.private?.ownerPhone ?? '', ownerAddress: b.private?.ownerAddress ?? '' });

/** Sent as typed: the schema trims, and an emptied box clears the saved value. */
const asSent = <V,>(v: V) => v;

export function PrivateForm({ build }: { build: OwnerBuild }) {
  const mutation = useSavePrivate(build.id);
  const { form, panel } = useEditorForm<Required<BuildPrivate>, BuildPrivate>({ formKey: 'private', schema: BuildPrivateSchema, fromBuild, clean: asSent, mutation, fields: Object.keys(BuildPrivateSchema.shape) });
  const { register, formState: { errors } } = form;
  return (
    <SectionForm id="private" title="Private details" {...panel}>
      <p className="border-l-4 border-ink bg-white/70 px-3 py-2 text-sm">
        <span className="font-semibold">Private — never on the public page or card.</span> Only you see these (and, once you enter a show, its organisers).
      </p>
      <div className="grid gap-4 sm:grid-cols-2">
        <TextField label="VIN or chassis number" autoComplete="off" {...register('vin')} error={errorAt(errors, 'vin')} />
        <TextField label="Plate" autoComplete="off" {...register('plate')} error={errorAt(errors, 'plate')} />
        <TextField label="Phone" type="tel" autoComplete="tel" {...register('ownerPhone')} error={errorAt(errors, 'ownerPhone')} />
        <TextAreaField label="Address" rows={3} autoComplete="street-address" {...register('ownerAddress')} error={errorAt(errors, 'ownerAddress')} />
      </div>
    </SectionForm>
  );
}
