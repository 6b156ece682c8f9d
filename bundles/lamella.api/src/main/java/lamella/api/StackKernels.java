package lamella.api;

/** Compiles a {@link Stack} into a {@link StackKernel}; provided as a service by the engine. */
public interface StackKernels {
    StackKernel compile(Stack stack);
}
