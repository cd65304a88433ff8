/**
 * The survey and room (or area) that were open, remembered durably so a cold start — iOS restarts
 * installed apps at their start URL after killing them in the background — reopens there.
 * Leaving for the survey list forgets it.
 */
import { readMeta, writeMeta, type LastOpen } from '../store/meta.ts';
import { getSurvey } from '../store/surveys.ts';
import { connection } from './storage-connection.ts';
import { navigation } from './navigation.svelte.ts';

/** Remember what is open (undefined: nothing). Failures are ignored: this is a convenience. */
export async function rememberOpen(open: LastOpen | undefined): Promise<void> {
  await writeMeta(connection, 'lastOpen', open).catch(() => undefined);
}

/** Keep the remembered place current as the surveyor moves about. */
export function trackOpen(): void {
  let last = '';
  const remember = ({ surveyId, roomId, areaId }: { surveyId: string | null; roomId: string | null; areaId: string | null }) => {
    const key = `${surveyId}/${roomId}/${areaId}`;
    if (key === last) return;
    last = key;
    void rememberOpen(surveyId ? { surveyId, ...(roomId ? { roomId } : areaId ? { areaId } : {}) } : undefined);
  };
  remember(navigation);
  navigation.onChange(remember);
}

/** On a bare cold start, go back to the survey (and room or area) that was open, if still on the device. */
export async function reopenLast(): Promise<void> {
  if (!navigation.startedBare) return;
  const last = await readMeta(connection, 'lastOpen').catch(() => undefined);
  if (!last || !(await getSurvey(connection, last.surveyId).catch(() => undefined))) return;
  if (navigation.screen !== 'surveys') return;
  const { surveyId, roomId, areaId } = last;
  navigation.go(roomId ? { screen: 'room', surveyId, roomId } : areaId ? { screen: 'area', surveyId, areaId } : { screen: 'overview', surveyId });
}
