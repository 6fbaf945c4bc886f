// Values from files shown in messages: control characters and escape sequences become visible
// escapes (ECMA-48 control functions: ESC 0x1b, BEL 0x07, CSI 0x9b; Unicode bidi controls
// U+202A..U+202E and U+2066..U+2069, from memory), and long values are cut at 80 characters.

import { describe, expect, it } from 'vitest';
import { escapeControls, shownText, SHOWN_VALUE_LIMIT } from '../../../engine/text/shown-text';
import { fileLocationText } from '../../../engine/errors';

describe('shownText', () => {
  it('escapes what a terminal would act on', () => {
    expect(shownText('\u001b]0;owned\u0007')).toBe('\\x1b]0;owned\\x07');
    expect(shownText('a\u001b[2Jb')).toBe('a\\x1b[2Jb');
    expect(shownText('x\u009b31m')).toBe('x\\x9b31m');
    expect(shownText('abc\u202edcba')).toBe('abc\\u202edcba');
    expect(shownText('two\nlines\r')).toBe('two\\x0alines\\x0d');
    expect(shownText('Liège – Köln €')).toBe('Liège – Köln €');
  });
  it('cuts a long value at the limit with an ellipsis, never inside a character', () => {
    expect(shownText('x'.repeat(SHOWN_VALUE_LIMIT))).toBe('x'.repeat(SHOWN_VALUE_LIMIT));
    expect(shownText('x'.repeat(100_000))).toBe('x'.repeat(SHOWN_VALUE_LIMIT) + '…');
    const emoji = '🚚'.repeat(SHOWN_VALUE_LIMIT + 1);
    expect(shownText(emoji)).toBe('🚚'.repeat(SHOWN_VALUE_LIMIT) + '…');
  });
  it('escapeControls keeps the characters asked for', () => {
    expect(escapeControls('a\tb\nc\u001b', '\n\t')).toBe('a\tb\nc\\x1b');
  });
  it('messages that locate a value show it escaped and cut', () => {
    const text = fileLocationText('lanes.csv', 4, 'notes\u001b[2J', '\u001b]2;x\u0007' + 'y'.repeat(500));
    expect(text).not.toMatch(/[\u0000-\u001f]/);
    expect(text).toContain('column "notes\\x1b[2J"');
    expect(text.endsWith('…"')).toBe(true);
  });
});
