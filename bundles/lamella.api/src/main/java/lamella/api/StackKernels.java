package lamella.api;

import org.osgi.annotation.versioning.ProviderType;

/** Compiles a {@link Stack} into a {@link StackKernel}; provided as a service by the engine. */
@ProviderType
public interface StackKernels {
    StackKernel compile(Stack stack);
}
