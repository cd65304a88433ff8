import { describe, it, expect } from 'vitest';
import { unsavedInput } from '../../src/app/unsaved-input.svelte.ts';

describe('unsaved input registry', () => {
  it('is pending while any form holds input, and clear once all release', () => {
    expect(unsavedInput.pending).toBe(false);
    const releaseA = unsavedInput.hold('room form');
    const releaseB = unsavedInput.hold('reading form');
    unsavedInput.hold('room form'); // holding twice counts once
    expect(unsavedInput.forms).toEqual(['room form', 'reading form']);
    releaseA();
    expect(unsavedInput.pending).toBe(true);
    releaseB();
    expect(unsavedInput.pending).toBe(false);
  });
});
