// The check kernels keep their intermediate values in stack structs (the inputs and outputs of a kernel, the result
// record). Without this attribute the JIT zeroes every such frame on entry, which cost as much as the arithmetic of a
// cheap check. C# still proves every local assigned before it is read, and the library uses no stackalloc, so skipping
// the zeroing changes no value (every test and snapshot is unchanged); GC references are still zeroed by the runtime.
[module: System.Runtime.CompilerServices.SkipLocalsInit]
