package trailcross.dynamics;

/** Receives each accepted step of an integration, with its dense output. */
@FunctionalInterface
public interface StepHandler {

    /**
     * @param step the step (valid only during the call; {@link DenseStep#copy()} to keep it)
     */
    void handle(DenseStep step);
}
