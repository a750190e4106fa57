import { zodResolver } from '@hookform/resolvers/zod';
import { useForm } from 'react-hook-form';
import { toast } from 'sonner';
import { setPinBodySchema, type SetPinBody } from '@shared/schemas/stations';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { applyServerErrors } from '@/lib/errors';
import { useSetPin } from '../api/set-pin';

/** The signed-in person's PIN for the crib station: with their badge it signs them in there, and nowhere else. */
export function StationPinCard() {
  const save = useSetPin();
  const form = useForm<SetPinBody>({ resolver: zodResolver(setPinBodySchema), defaultValues: { pin: '' } });
  const { errors } = form.formState;

  const submit = form.handleSubmit(async (body) => {
    try {
      await save.mutateAsync(body);
      form.reset({ pin: '' });
      toast.success('Your station PIN is saved.');
    } catch (err) {
      form.setError('root', { message: applyServerErrors(err, form.setError, ['pin']) });
    }
  });

  return (
    <Card title="Station PIN">
      <p className="mb-3">With your badge, this PIN signs you in at the crib station. It never signs you in anywhere else.</p>
      <form onSubmit={submit} noValidate className="flex flex-col gap-3" aria-label="Station PIN">
        {errors.root?.message && <Notice tone="bad">{errors.root.message}</Notice>}
        <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
          <div className="sm:w-56">
            <TextField label="New PIN" type="password" inputMode="numeric" autoComplete="off" maxLength={8} hint="4 to 8 digits." error={errors.pin?.message} {...form.register('pin')} />
          </div>
          <Button type="submit" variant="secondary" busy={save.isPending}>
            Save PIN
          </Button>
        </div>
      </form>
    </Card>
  );
}
