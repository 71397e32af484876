// The part of markdown-it 10 (no types of its own) that walk-first-paint.ts uses.
declare module 'markdown-it' {
  interface Token {
    type: string;
    tag: string;
    content: string;
    markup: string;
    hidden: boolean;
    children: Token[] | null;
    attrGet(name: string): string | null;
  }
  class MarkdownIt {
    constructor(options?: { html?: boolean; linkify?: boolean; typographer?: boolean });
    parse(src: string, env: object): Token[];
  }
  export default MarkdownIt;
}
