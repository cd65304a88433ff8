import 'fake-indexeddb/auto';
import { describe, it, expect, vi, beforeEach, afterEach } from 'vitest';
import { Autosave } from '../../src/app/autosave.svelte.ts';
import { unsavedInput } from '../../src/app/unsaved-input.svelte.ts';
import { saveSurvey, getSurvey } from '../../src/store/surveys.ts';
import { newSurveyRecord } from '../../src/model/survey-defaults.ts';
import { closeAll, freshConnection } from '../support/store-helpers.ts';

beforeEach(() => vi.useFakeTimers());
afterEach(() => {
  vi.useRealTimers();
  vi.restoreAllMocks();
  closeAll();
});

function recorder() {
  const saved: string[] = [];
  let fail: Error | null = null;
  const autosave = new Autosave<string>({
    form: 'test form',
    delayMs: 400,
    now: () => new Date('2026-01-14T10:00:00Z'),
    save: async (value) => {
      await Promise.resolve();
      if (fail) throw fail;
      saved.push(value);
    },
  });
  return { autosave, saved, failWith: (e: Error | null) => (fail = e) };
}

describe('autosave', () => {
  it('saves once, 400 ms after the last keystroke', async () => {
    const { autosave, saved } = recorder();
    autosave.edit('B');
    await vi.advanceTimersByTimeAsync(300);
    autosave.edit('Bl');
    await vi.advanceTimersByTimeAsync(300);
    expect(saved).toEqual([]);
    expect(autosave.state).toBe('pending');
    expect(unsavedInput.forms).toContain('test form');
    await vi.advanceTimersByTimeAsync(100);
    expect(saved).toEqual(['Bl']);
    expect(autosave.state).toBe('saved');
    expect(autosave.savedAt?.toISOString()).toBe('2026-01-14T10:00:00.000Z');
    expect(unsavedInput.forms).not.toContain('test form');
  });

  it('saves at once on flush (a change event), without waiting', async () => {
    const { autosave, saved } = recorder();
    autosave.edit('Block C');
    await autosave.flush();
    expect(saved).toEqual(['Block C']);
    await vi.advanceTimersByTimeAsync(1000);
    expect(saved).toEqual(['Block C']);
  });

  it('saves an edit made during a save straight after it, in order', async () => {
    const { autosave, saved } = recorder();
    autosave.edit('one');
    const first = autosave.flush();
    autosave.edit('two');
    await first;
    await vi.advanceTimersByTimeAsync(0);
    expect(saved).toEqual(['one', 'two']);
    expect(autosave.state).toBe('saved');
  });

  it('says NOT SAVED when the save fails, keeps the edit, and saves it on retry', async () => {
    const { autosave, saved, failWith } = recorder();
    failWith(Object.assign(new Error('On-device storage refused the change: aborted'), { name: 'AbortError' }));
    autosave.edit('Flat 3 bedroom');
    await vi.advanceTimersByTimeAsync(400);
    expect(autosave.state).toBe('failed');
    expect(autosave.error).toMatch(/refused the change/);
    expect(autosave.unsaved).toBe('Flat 3 bedroom');
    expect(unsavedInput.forms).toContain('test form');
    failWith(null);
    await autosave.retry();
    expect(saved).toEqual(['Flat 3 bedroom']);
    expect(autosave.state).toBe('saved');
    expect(autosave.error).toBeNull();
  });

  it('keeps showing NOT SAVED while new edits wait, until a save succeeds', async () => {
    const { autosave, failWith } = recorder();
    failWith(new Error('full'));
    autosave.edit('a');
    await autosave.flush();
    autosave.edit('ab');
    expect(autosave.state).toBe('failed');
    failWith(null);
    await vi.advanceTimersByTimeAsync(400);
    expect(autosave.state).toBe('saved');
  });

  it('holds input it cannot save, with the reason', () => {
    const { autosave } = recorder();
    autosave.refuse('Survey title is empty: give the survey a name');
    expect(autosave.state).toBe('failed');
    expect(autosave.error).toMatch(/title is empty/);
    expect(unsavedInput.pending).toBe(true);
  });

  it('keeps saying NOT SAVED when input is refused while an earlier save is still landing', async () => {
    const { autosave, saved } = recorder();
    autosave.edit('room as a box');
    const landing = autosave.flush(); // the save is in flight…
    autosave.refuse('Room length must be a number in m'); // …when a part without its length is added
    await landing;
    expect(saved).toEqual(['room as a box']);
    expect(autosave.state).toBe('failed');
    expect(autosave.error).toBe('Room length must be a number in m');
    expect(unsavedInput.forms).toContain('test form');
    autosave.edit('room of two parts'); // the length typed: valid again
    await autosave.flush();
    expect(autosave.state).toBe('saved');
    expect(autosave.error).toBeNull();
  });

  it('saves the valid part of input that breaks a rule, and still says NOT SAVED for the rest', async () => {
    const { autosave, saved } = recorder();
    autosave.editPartly('room renamed, old height', 'Height must be between 1.5 and 10 m; the rest of this room is saved.');
    expect(autosave.state).toBe('failed');
    await vi.advanceTimersByTimeAsync(400);
    expect(saved).toEqual(['room renamed, old height']);
    expect(autosave.state).toBe('failed');
    expect(autosave.error).toMatch(/^Height must be between/);
    expect(unsavedInput.forms).toContain('test form');
    autosave.edit('room renamed, height put right');
    await autosave.flush();
    expect(saved.at(-1)).toBe('room renamed, height put right');
    expect(autosave.state).toBe('saved');
    expect(autosave.error).toBeNull();
  });

  it('lets refused input go when its form closes, but keeps a failed save of valid input', async () => {
    const { autosave, failWith } = recorder();
    autosave.refuse('Survey title is empty: give the survey a name');
    autosave.closeForm();
    expect(autosave.state).toBe('saved');
    expect(unsavedInput.forms).not.toContain('test form');
    failWith(new Error('full'));
    autosave.edit('valid but not saved');
    await autosave.flush();
    autosave.closeForm();
    expect(autosave.state).toBe('failed');
    expect(autosave.unsaved).toBe('valid but not saved');
  });

  it('saves at once when the page is hidden or unloaded', async () => {
    const { autosave, saved } = recorder();
    const target = new EventTarget() as unknown as Window;
    const doc = Object.assign(new EventTarget(), { visibilityState: 'visible' });
    Object.defineProperty(target, 'document', { value: doc });
    const detach = autosave.attach(target);
    autosave.edit('hidden');
    doc.visibilityState = 'hidden';
    doc.dispatchEvent(new Event('visibilitychange'));
    await vi.advanceTimersByTimeAsync(0);
    expect(saved).toEqual(['hidden']);
    autosave.edit('unloaded');
    target.dispatchEvent(new Event('pagehide'));
    await vi.advanceTimersByTimeAsync(0);
    expect(saved).toEqual(['hidden', 'unloaded']);
    detach();
  });

  it('shows NOT SAVED for a real transaction abort, with the edit still in memory and the stored record unchanged', async () => {
    vi.useRealTimers();
    const connection = freshConnection();
    const original = newSurveyRecord({ title: 'Block C (invented)', site: '', buildingUse: 'school' }, '0d0d0000-0000-4000-8000-000000000001', '2026-01-14T09:00:00Z');
    await saveSurvey(connection, original);
    const autosave = new Autosave({ form: 'abort test', save: async (s: typeof original) => void (await saveSurvey(connection, s)) });
    const put = vi.spyOn(IDBObjectStore.prototype, 'put').mockImplementation(function (this: IDBObjectStore) {
      const request = this.count();
      this.transaction.abort();
      return request as unknown as IDBRequest<IDBValidKey>;
    });
    autosave.edit({ ...original, title: 'Block C, ground floor (invented)' });
    await autosave.flush();
    put.mockRestore();
    expect(autosave.state).toBe('failed');
    expect(autosave.unsaved?.title).toBe('Block C, ground floor (invented)');
    expect((await getSurvey(connection, original.id))!.title).toBe('Block C (invented)');
    await autosave.retry();
    expect(autosave.state).toBe('saved');
    expect((await getSurvey(connection, original.id))!.title).toBe('Block C, ground floor (invented)');
  });
});
