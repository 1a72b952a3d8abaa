// maxrects-packer's package entry exports nothing under Node's ES modules, so the benchmark
// imports its ES build by path; this gives that path the package's own types.
declare module 'maxrects-packer/dist/maxrects-packer.mjs' {
  export * from 'maxrects-packer';
}
