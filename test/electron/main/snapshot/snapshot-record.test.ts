// @vitest-environment node
import { describe, expect, it } from 'vitest';
import {
  createSnapshotText,
  parseSnapshotText,
  sealOf,
  stripPatientFields,
} from '../../../../electron/main/snapshot/snapshot-record.ts';

// A fixed key for the tests (the app makes a random one, see snapshot-key.ts).
const key = Buffer.alloc(32, 7);

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
    const text = createSnapshotText(
      { content: draft, keepPatient: false, documentPath: '/h/t.cwtopic', savedAt: 1_700_000_000_000 },
      key,
    );
    expect(text).not.toContain('Ann Example');
    expect(text).not.toContain('NHS 000');
    expect(parseSnapshotText(text, key)?.keepsPatient).toBe(false);
  });

  it('keeps the patient details when asked to', () => {
    const text = createSnapshotText({ content: draft, keepPatient: true, documentPath: null, savedAt: 5 }, key);
    expect(parseSnapshotText(text, key)?.content).toEqual(draft);
  });
});

describe('parseSnapshotText()', () => {
  const text = createSnapshotText(
    { content: { title: 'T' }, keepPatient: false, documentPath: '/h/t.cwtopic', savedAt: 1234 },
    key,
  );

  it('reads back a snapshot it wrote', () => {
    expect(parseSnapshotText(text, key)).toEqual({
      format: 'chancewise-snapshot',
      version: 2,
      savedAt: 1234,
      documentPath: '/h/t.cwtopic',
      keepsPatient: false,
      content: { title: 'T' },
      // HMAC-SHA-256 under 32 bytes of 0x07 of the sealed fields as JSON, as OpenSSL gives it:
      // printf '%s' '["chancewise-snapshot",2,1234,"/h/t.cwtopic",false,{"title":"T"}]' |
      //   openssl dgst -sha256 -mac HMAC -macopt hexkey:0707…07
      seal: '8853f5110af976a7e457037c68d113d571949a467ca9e05147b8ba266ccffaf2',
    });
  });

  it('seals with HMAC-SHA-256', () => {
    // RFC 4231, §4.3, test case 2: key "Jefe", data "what do ya want for nothing?".
    expect(sealOf(Buffer.from('Jefe'), 'what do ya want for nothing?')).toBe(
      '5bdcc146bf60754e6a042426089575c75a003f089d2739839dec58b964ec3843',
    );
  });

  it('rejects a truncated, altered or foreign file', () => {
    expect(parseSnapshotText(text.slice(0, text.length / 2), key)).toBeNull();
    expect(parseSnapshotText(text.replace('"title":"T"', '"title":"U"'), key)).toBeNull();
    expect(parseSnapshotText(text.replace('chancewise-snapshot', 'other'), key)).toBeNull();
    expect(parseSnapshotText(text.replace('"version":2', '"version":1'), key)).toBeNull();
    expect(parseSnapshotText(text.replace('"savedAt":1234', '"savedAt":-1'), key)).toBeNull();
    expect(parseSnapshotText('', key)).toBeNull();
    expect(parseSnapshotText('[]', key)).toBeNull();
  });
});
