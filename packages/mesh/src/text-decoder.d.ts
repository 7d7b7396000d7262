// The WHATWG Encoding Standard's decoder, present in every runtime this package runs in (Node.js since 11, every
// browser); declared here because the package compiles with neither DOM nor Node types.
declare class TextDecoder {
  constructor(label?: string, options?: { fatal?: boolean; ignoreBOM?: boolean });
  readonly encoding: string;
  decode(input?: ArrayBufferView | ArrayBuffer, options?: { stream?: boolean }): string;
}
