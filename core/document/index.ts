/** core/document: The printable report of a hull as one self-contained HTML document. It may import every layer below it (common to plots). */
export * from './reportHtml.js';
