package lamella.engine;

import lamella.api.Stack;
import lamella.api.StackKernel;
import lamella.api.StackKernels;
import org.osgi.service.component.annotations.Component;

/** Offers the layered-stack kernel as a service (the annotation is build-time only; no OSGi at run time). */
@Component(service = StackKernels.class)
public final class Engine implements StackKernels {

    @Override
    public StackKernel compile(Stack stack) {
        return new LayeredStack(stack);
    }
}
