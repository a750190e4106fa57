import { useState } from 'react';
import { toast } from 'sonner';
import { momentInWords } from '@shared/time/chapter-time';
import { Button } from '@/components/ui/button';
import { SelectField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { Card } from '@/components/ui/page';
import { messageOf } from '@/lib/errors';
import { useUpdateCribSettings } from '../api/update-crib-settings';

/** Every zone this browser knows, with the chapter's own first in the list if the browser lacks it. */
const zonesWith = (current: string): string[] => {
  const known = Intl.supportedValuesOf('timeZone');
  return known.includes(current) ? known : [current, ...known];
};

/**
 * The chapter's time zone: the clock every due date, "days late", reminder and digest counts its days
 * by. Only a chapter lead may change it (the server says so too); others read it.
 */
export function TimeZoneCard({ timeZone, canChange }: { timeZone: string; canChange: boolean }) {
  return (
    <Card title="Time zone">
      <p className="mb-3">
        Loans fall due at the end of a day, reminders go out once a day and the morning lists come at 07:00, all on the chapter&apos;s clock:{' '}
        <strong>{timeZone.replaceAll('_', ' ')}</strong>, where it is now {momentInWords(new Date(), timeZone)}.
      </p>
      {canChange ? <TimeZoneForm timeZone={timeZone} /> : <p className="text-sm text-steel">Only the chapter lead changes the time zone.</p>}
    </Card>
  );
}

function TimeZoneForm({ timeZone }: { timeZone: string }) {
  const update = useUpdateCribSettings();
  const [zone, setZone] = useState(timeZone);
  const [problem, setProblem] = useState<string>();
  const options = zonesWith(timeZone).map((z) => ({ value: z, label: z.replaceAll('_', ' ') }));

  const submit = async (e: React.FormEvent) => {
    e.preventDefault();
    setProblem(undefined);
    try {
      const saved = await update.mutateAsync({ timeZone: zone });
      toast.success(`The chapter's days now run on ${saved.timeZone.replaceAll('_', ' ')} time.`);
    } catch (err) {
      setProblem(messageOf(err));
    }
  };

  return (
    <form onSubmit={(e) => void submit(e)} noValidate className="flex flex-col gap-3" aria-label="Time zone">
      {problem && <Notice tone="bad">{problem}</Notice>}
      <div className="flex flex-col gap-3 sm:flex-row sm:items-end">
        <div className="sm:w-72">
          <SelectField label="The chapter's time zone" options={options} value={zone} onChange={(e) => setZone(e.target.value)} />
        </div>
        <Button type="submit" variant="secondary" busy={update.isPending} disabled={zone === timeZone}>
          Save time zone
        </Button>
      </div>
      <p className="text-sm text-steel">Loans already out keep their due moment; new loans and the day counts follow the new zone.</p>
    </form>
  );
}
