const useColour = process.stdout.isTTY && !process.env.NO_COLOR;
const paint = (code: string, text: string) => (useColour ? `\x1b[${code}m${text}\x1b[0m` : text);

export const log = {
  step: (text: string) => console.log(`${paint('36', '›')} ${text}`),
  ok: (text: string) => console.log(`${paint('32', '✓')} ${text}`),
  warn: (text: string) => console.warn(`${paint('33', '!')} ${text}`),
  fail: (text: string) => console.error(`${paint('31', '✗')} ${text}`),
  bold: (text: string) => paint('1', text),
};

/** An error whose message is meant for the person running the command: no stack is printed. */
export class StackError extends Error {}
