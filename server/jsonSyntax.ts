/**
 * Where JSON text first breaks the grammar of RFC 8259, for error messages: V8's
 * JSON.parse does not always say. Only called after JSON.parse has failed. Iterative,
 * so that deeply nested input cannot overflow the stack.
 */

/** 1-based line and column of a character offset. */
export function lineColumn(text: string, offset: number): { line: number; column: number } {
  let line = 1;
  let start = 0;
  for (let i = 0; i < offset && i < text.length; i++) {
    if (text.charCodeAt(i) === 10) {
      line++;
      start = i + 1;
    }
  }
  return { line, column: offset - start + 1 };
}

const NUMBER = /-?(?:0|[1-9]\d*)(?:\.\d+)?(?:[eE][+-]?\d+)?/y;
const STRING = /"(?:[^"\\\u0000-\u001f]|\\(?:["\\/bfnrt]|u[0-9a-fA-F]{4}))*"/y;

/** Offset of the first character that breaks the grammar (text.length when the text ends too soon), or -1 when it is valid. */
export function jsonErrorOffset(text: string): number {
  let i = 0;
  const stack: ('[' | '{')[] = [];
  const ws = (): void => {
    while (i < text.length && ' \t\n\r'.includes(text[i]!)) i++;
  };
  const match = (re: RegExp): boolean => {
    re.lastIndex = i;
    if (!re.test(text)) return false;
    i = re.lastIndex;
    return true;
  };
  // After a value: close containers or move to the next member.
  const afterValue = (): number | 'value' | 'key' | 'done' => {
    for (;;) {
      ws();
      const top = stack[stack.length - 1];
      if (top === undefined) return i === text.length ? 'done' : i;
      const c = text[i];
      if (c === ',') {
        i++;
        return top === '[' ? 'value' : 'key';
      }
      if ((top === '[' && c === ']') || (top === '{' && c === '}')) {
        i++;
        stack.pop();
        continue;
      }
      return i;
    }
  };
  let want: 'value' | 'key' = 'value';
  for (;;) {
    ws();
    if (want === 'key') {
      if (!match(STRING)) return i;
      ws();
      if (text[i] !== ':') return i;
      i++;
      ws();
    }
    const c = text[i];
    if (c === '[' || c === '{') {
      i++;
      stack.push(c);
      ws();
      if (text[i] === (c === '[' ? ']' : '}')) {
        i++;
        stack.pop();
      } else {
        want = c === '[' ? 'value' : 'key';
        continue;
      }
    } else if (!(match(STRING) || match(NUMBER) || ['true', 'false', 'null'].some((w) => text.startsWith(w, i) && ((i += w.length), true)))) {
      return i;
    }
    const next = afterValue();
    if (next === 'done') return -1;
    if (typeof next === 'number') return next;
    want = next;
  }
}
