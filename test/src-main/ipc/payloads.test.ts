import { describe, expect, it } from 'vitest';
import { INVOKE_CHANNELS, SEND_CHANNELS, EVENT_CHANNELS } from '../../../src-main/ipc/channels.ts';
import { INVOKE_PAYLOADS, MAX_TEXT_CHARS, SEND_PAYLOADS, describePayloadError } from '../../../src-main/ipc/payloads.ts';

const save = { path: '/home/u/buck.json', suggestedName: 'buck.json', text: '{}' };

describe('IPC payload schemas', () => {
  it('exist for exactly the methods that have channels', () => {
    expect(Object.keys(INVOKE_PAYLOADS).sort()).toEqual(Object.keys(INVOKE_CHANNELS).sort());
    expect(Object.keys(SEND_PAYLOADS).sort()).toEqual(Object.keys(SEND_CHANNELS).sort());
  });

  it('use distinct channel names', () => {
    const names = [...Object.values(INVOKE_CHANNELS), ...Object.values(SEND_CHANNELS), ...Object.values(EVENT_CHANNELS)];
    expect(new Set(names).size).toBe(names.length);
  });

  it('accept well-formed calls', () => {
    expect(INVOKE_PAYLOADS.saveDesign.safeParse([save]).success).toBe(true);
    expect(INVOKE_PAYLOADS.saveDesign.safeParse([{ ...save, path: null }]).success).toBe(true);
    expect(INVOKE_PAYLOADS.openDesign.safeParse([]).success).toBe(true);
    expect(INVOKE_PAYLOADS.printToPdf.safeParse([{ suggestedName: 'report', pageSize: 'A4' }]).success).toBe(true);
    expect(INVOKE_PAYLOADS.exportFile.safeParse([{ suggestedName: 'chart.png', content: 'iVBORw0KGgo=', encoding: 'base64', filterName: 'PNG image', extensions: ['png'] }]).success).toBe(true);
    expect(SEND_PAYLOADS.setDocumentState.safeParse([{ name: 'buck.json', dirty: true }]).success).toBe(true);
  });

  it('refuse wrong types, extra keys, extra arguments and oversize text', () => {
    const refused: [keyof typeof INVOKE_PAYLOADS, unknown[]][] = [
      ['saveDesign', [{ ...save, text: 42 }]],
      ['saveDesign', [{ ...save, extra: true }]], // strict objects: unknown keys refused
      ['saveDesign', [save, 'second argument']],
      ['saveDesign', [{ ...save, path: '/tmp/a\0b.json' }]],
      ['saveDesign', [{ ...save, suggestedName: '../../.bashrc' }]],
      ['saveDesign', [{ ...save, text: 'x'.repeat(MAX_TEXT_CHARS + 1) }]],
      ['openDesign', ['/etc/passwd']],
      ['printToPdf', [{ suggestedName: 'r', pageSize: 'A0' }]],
      ['exportFile', [{ suggestedName: 'c.png', content: '<svg/>', encoding: 'base64', filterName: 'PNG', extensions: ['png'] }]],
      ['exportFile', [{ suggestedName: 'c.csv', content: 'a,b', encoding: 'utf8', filterName: 'CSV', extensions: ['../csv'] }]],
      ['writeRecovery', [null]],
    ];
    for (const [method, args] of refused) expect(INVOKE_PAYLOADS[method].safeParse(args).success, `${method} ${JSON.stringify(args).slice(0, 80)}`).toBe(false);
  });

  it('describe a refusal by argument path and reason', () => {
    const result = INVOKE_PAYLOADS.saveDesign.safeParse([{ ...save, text: 42 }]);
    expect(result.success).toBe(false);
    if (!result.success) expect(describePayloadError('saveDesign', result.error)).toMatch(/^Refused saveDesign: argument 0\.text: .+\.$/);
  });
});
