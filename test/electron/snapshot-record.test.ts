// @vitest-environment node
import { describe, expect, it } from 'vitest';
import { contentChecksum, createSnapshotText, parseSnapshotText, stripPatientFields } from '../../electron/snapshot-record.ts';

const draft = {
  title: 'Illustrative topic',
  patientName: 'Ann Example',
  patientReference: 'NHS 000 000 0000',
  patient: { name: 'Ann Example', reference: 'R-1' },
  outcomes: [{ name: 'a stroke', patientNotes: ['x'] }],
  patiently: 'not a patient field',
};

describe('stripPatientFields()', () => {
  it('blanks patient-identifying fields at any depth and keeps everything else', () => {
    expect(stripPatientFields(draft)).toEqual({
      title: 'Illustrative topic',
      patientName: '',
      patientReference: '',
      patient: null,
      outcomes: [{ name: 'a stroke', patientNotes: null }],
      patiently: 'not a patient field',
    });
  });

  it('strips the patient of a topic file', () => {
    const file = { format: 'chancewise-topic', version: 2, topic: { title: 'T', patient: { name: 'B', reference: 'C' } } };
    expect(stripPatientFields(file)).toEqual({ format: 'chancewise-topic', version: 2, topic: { title: 'T', patient: null } });
  });

  it('does not change its input', () => {
    const copy = structuredClone(draft);
    stripPatientFields(draft);
    expect(draft).toEqual(copy);
  });
});

describe('createSnapshotText()', () => {
  it('stores no patient details unless the person chose to keep them', () => {
    const text = createSnapshotText({ content: draft, keepPatient: false, documentPath: '/h/t.cwtopic', savedAt: 1_700_000_000_000 });
    expect(text).not.toContain('Ann Example');
    expect(text).not.toContain('NHS 000');
    expect(parseSnapshotText(text)?.keepsPatient).toBe(false);
  });

  it('keeps the patient details when asked to', () => {
    const text = createSnapshotText({ content: draft, keepPatient: true, documentPath: null, savedAt: 5 });
    expect(parseSnapshotText(text)?.content).toEqual(draft);
  });
});

describe('parseSnapshotText()', () => {
  const text = createSnapshotText({ content: { title: 'T' }, keepPatient: false, documentPath: '/h/t.cwtopic', savedAt: 1234 });

  it('reads back a snapshot it wrote', () => {
    expect(parseSnapshotText(text)).toEqual({
      format: 'chancewise-snapshot',
      version: 1,
      savedAt: 1234,
      documentPath: '/h/t.cwtopic',
      keepsPatient: false,
      content: { title: 'T' },
      // SHA-256 of the JSON text {"title":"T"} (FIPS 180-4), as `printf '{"title":"T"}' | sha256sum` gives it.
      checksum: '6d05dcd7395808f66309c9411db93fdc57fb861efc95938239e2459de048f547',
    });
  });

  it('computes the checksum over the content as JSON', () => {
    expect(contentChecksum({ title: 'T' })).toBe('6d05dcd7395808f66309c9411db93fdc57fb861efc95938239e2459de048f547');
  });

  it('rejects a truncated, altered or foreign file', () => {
    expect(parseSnapshotText(text.slice(0, text.length / 2))).toBeNull();
    expect(parseSnapshotText(text.replace('"title":"T"', '"title":"U"'))).toBeNull();
    expect(parseSnapshotText(text.replace('chancewise-snapshot', 'other'))).toBeNull();
    expect(parseSnapshotText(text.replace('"version":1', '"version":2'))).toBeNull();
    expect(parseSnapshotText(text.replace('"savedAt":1234', '"savedAt":-1'))).toBeNull();
    expect(parseSnapshotText('')).toBeNull();
    expect(parseSnapshotText('[]')).toBeNull();
  });
});
