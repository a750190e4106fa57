import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { MM_PER_INCH } from '@shared/estimate/rivet-rules';
import { createBuildBodySchema, type LengthUnit } from '@shared/schemas/builds';
import { TextField } from '@/components/ui/field';
import { FormFooter } from '@/components/ui/form-footer';
import { Notice } from '@/components/ui/notice';
import { applyServerErrors } from '@/lib/errors';
import { useCreateBuild } from '../api/save-build';

interface Values {
  name: string;
  description: string;
  edgeFloor: string;
}

/** A new build: a name, what it is, and the kit standard's own edge distance floor if it sets one. */
export function NewBuildForm({ unit, onDone }: { unit: LengthUnit; onDone?: () => void }) {
  const create = useCreateBuild();
  const form = useForm<Values>({ defaultValues: { name: '', description: '', edgeFloor: '' } });
  const { errors, isSubmitting } = form.formState;

  const submit = form.handleSubmit(async (v) => {
    const floor = v.edgeFloor.trim() === '' ? null : Number(v.edgeFloor.trim().replace(',', '.'));
    if (floor !== null && !Number.isFinite(floor)) {
      form.setError('edgeFloor', { message: `Enter the floor as a number of ${unit === 'mm' ? 'millimetres, like 10' : 'inches, like 0.375'}.` });
      return;
    }
    const parsed = createBuildBodySchema.safeParse({
      name: v.name,
      description: v.description,
      // Builds keep their floor in inches; a member may think in millimetres.
      edgeFloorIn: floor === null ? null : unit === 'mm' ? floor / MM_PER_INCH : floor,
    });
    if (!parsed.success) {
      for (const issue of parsed.error.issues) {
        const at = issue.path[0] === 'edgeFloorIn' ? 'edgeFloor' : issue.path[0] === 'description' ? 'description' : 'name';
        form.setError(at, { message: issue.message });
      }
      return;
    }
    try {
      const build = await create.mutateAsync(parsed.data);
      toast.success(`${build.name} is started: add its first assembly.`);
      form.reset();
      onDone?.();
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['name', 'description']) });
    }
  });

  return (
    <form aria-label="New build" onSubmit={submit} noValidate className="flex flex-col gap-4">
      {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
      <TextField label="Build name" placeholder="Two-seat low wing" autoComplete="off" error={errors.name?.message} {...form.register('name')} />
      <TextField label="Description (optional)" error={errors.description?.message} {...form.register('description')} />
      <TextField
        label={`Edge distance floor (${unit}, optional)`}
        inputMode="decimal"
        autoComplete="off"
        hint={`If the kit’s standard sets a minimum edge distance, like ${unit === 'mm' ? '10 mm' : '3/8 in (0.375)'}; lines use the larger of it and 2D.`}
        error={errors.edgeFloor?.message}
        {...form.register('edgeFloor')}
      />
      <FormFooter submit="Start the build" busy={isSubmitting} />
    </form>
  );
}
