// `npm run build:wasm`: rebuilds shared/fitting/wasm/bell-wasm.ts from the AssemblyScript kernel.
import { writeFileSync } from 'node:fs';
import { compileKernel, KERNEL_MODULE, renderKernelModule } from '../shared/fitting/wasm/compile';

const binary = await compileKernel();
writeFileSync(KERNEL_MODULE, renderKernelModule(binary));
console.log(`wrote ${KERNEL_MODULE} (${binary.length} bytes of WebAssembly)`);
