// comlink ships the node adapter's types beside its .mjs without a declaration TypeScript resolves.
declare module 'comlink/dist/esm/node-adapter.mjs' {
  export { default } from 'comlink/dist/esm/node-adapter';
}
