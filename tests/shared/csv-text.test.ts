import { describe, expect, it } from 'vitest';
import { decodeCsvBytes, lineWithReplacementCharacter, NOT_TEXT_PROBLEM } from '@shared/stock/csv-text';

const utf8 = (s: string) => new TextEncoder().encode(s);
// "Société Aéro" in Windows-1252: é is the single byte 0xE9 (the code page's published table).
const windows1252 = Uint8Array.from([...'supplier\nSoci'].map((c) => c.charCodeAt(0)).concat([0xe9], [...'t'].map((c) => c.charCodeAt(0)), [0xe9], [...' A'].map((c) => c.charCodeAt(0)), [0xe9], [...'ro'].map((c) => c.charCodeAt(0))));

describe('decodeCsvBytes', () => {
  it('reads UTF-8 as UTF-8, and drops a byte-order mark', () => {
    expect(decodeCsvBytes(utf8('supplier\nSociété Aéro'))).toEqual({ text: 'supplier\nSociété Aéro', encoding: 'utf-8' });
    expect(decodeCsvBytes(Uint8Array.from([0xef, 0xbb, 0xbf, ...utf8('code\nB-0001')]))).toEqual({ text: 'code\nB-0001', encoding: 'utf-8' });
  });

  it('reads a file that is plainly Windows-1252 as Windows-1252, accents and the euro sign intact', () => {
    expect(decodeCsvBytes(windows1252)).toEqual({ text: 'supplier\nSociété Aéro', encoding: 'windows-1252' });
    expect(decodeCsvBytes(Uint8Array.from([0x80, 0x20, 0x31, 0x32]))).toEqual({ text: '€ 12', encoding: 'windows-1252' });
  });

  it('refuses bytes that are neither, and binary files, with a sentence to act on', () => {
    expect(decodeCsvBytes(Uint8Array.from([0x41, 0x81, 0x42]))).toEqual({ problem: NOT_TEXT_PROBLEM });
    expect(decodeCsvBytes(Uint8Array.from([0x50, 0x4b, 0x03, 0x04, 0xff, 0x00]))).toEqual({ problem: NOT_TEXT_PROBLEM });
    expect(decodeCsvBytes(utf8('code\u0000name'))).toEqual({ problem: NOT_TEXT_PROBLEM });
  });
});

describe('lineWithReplacementCharacter', () => {
  it('names the line of text that was mangled before it arrived', () => {
    expect(lineWithReplacementCharacter('code,supplier\nB-0001,Soci\uFFFDt\uFFFD')).toBe(2);
    expect(lineWithReplacementCharacter('code\nB-0001')).toBeUndefined();
  });
});

describe('the Windows-1252 bytes 0x80–0x9F', () => {
  it('map as the WHATWG Encoding Standard index-windows-1252 table gives them', () => {
    // index-windows-1252: 0x80 €, 0x85 …, 0x91 ‘, 0x92 ’, 0x93 “, 0x94 ”, 0x96 –, 0x97 —, 0x99 ™
    const decoded = decodeCsvBytes(Uint8Array.from([0x80, 0x85, 0x91, 0x92, 0x93, 0x94, 0x96, 0x97, 0x99]));
    expect(decoded).toEqual({ text: '€…‘’“”–—™', encoding: 'windows-1252' });
  });
});
