import type { Reaction } from '../../events/domain-events';
import { endHoldsOfPerson } from './holds.service';

/** A person who leaves the chapter waits for no tool: their holds end and a tool set aside for them passes on. */
export const endHoldsOfDeactivated: Reaction<'person.deactivated'> = (ctx, e) => endHoldsOfPerson(ctx, e.userId, e.at);
