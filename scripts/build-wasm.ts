// `npm run build:wasm`: rebuilds shared/fitting/wasm/bell-wasm.ts from the AssemblyScript kernel.
import { writeFileSync } from 'node:fs';
import {
  compileKernel,
  KERNEL_MODULE,
  renderKernelModule,
  renderTTable,
  T_TABLE_SOURCE,
} from '../shared/fitting/wasm/compile';

writeFileSync(T_TABLE_SOURCE, renderTTable());
const binary = await compileKernel();
writeFileSync(KERNEL_MODULE, renderKernelModule(binary));
console.log(`wrote ${KERNEL_MODULE} (${binary.length} bytes of WebAssembly)`);
