import { useState } from 'react';
import { useNavigate } from 'react-router';
import { enrolStationBodySchema } from '@shared/schemas/stations';
import { Button } from '@/components/ui/button';
import { TextField } from '@/components/ui/field';
import { Notice } from '@/components/ui/notice';
import { messageOf } from '@/lib/errors';
import { keepStation } from '../api/kept-station';
import { useEnrolStation } from '../api/stations';

/** Makes this browser a station: it keeps the station's token and opens the full-screen station. */
export function EnrolStationForm() {
  const enrol = useEnrolStation();
  const navigate = useNavigate();
  const [name, setName] = useState('');
  const [problem, setProblem] = useState<string>();

  return (
    <form
      className="flex flex-col gap-3"
      noValidate
      onSubmit={(e) => {
        e.preventDefault();
        const body = enrolStationBodySchema.safeParse({ name });
        if (!body.success) {
          setProblem(body.error.issues[0]?.message);
          return;
        }
        setProblem(undefined);
        enrol.mutate(body.data, {
          onSuccess: (station) => {
            keepStation({ token: station.stationToken, id: station.id, name: station.name });
            void navigate('/station');
          },
          onError: (err) => setProblem(messageOf(err)),
        });
      }}
    >
      <Notice tone="warn" title="Anyone at this device can sign in">
        Once this device is a station, anyone standing at it can sign in with their badge and PIN and take tools and stock in their
        own name. Use it on a tablet that stays at the crib, not on your own phone.
      </Notice>
      <TextField label="Station name" hint="Where it stands, for the history: “Crib door tablet”." value={name} onChange={(e) => setName(e.target.value)} error={problem} maxLength={60} autoComplete="off" />
      <div>
        <Button type="submit" busy={enrol.isPending}>
          Use this device as a station
        </Button>
      </div>
    </form>
  );
}
