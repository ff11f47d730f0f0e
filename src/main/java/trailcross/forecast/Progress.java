package trailcross.forecast;

import java.util.function.LongConsumer;

/** Where a long stage reports how far it has got (the command line shows a progress bar). */
@FunctionalInterface
public interface Progress {

    /** Reports nowhere. */
    Progress NONE = (label, total) -> new Stage() {
        @Override
        public void accept(long done) {
        }

        @Override
        public void close() {
        }
    };

    /** One stage: receives the count done so far; closed when the stage ends. */
    interface Stage extends LongConsumer, AutoCloseable {
        @Override
        void close();
    }

    /**
     * @param label what the stage does
     * @param total how many items it has
     * @return the stage's sink
     */
    Stage open(String label, long total);
}
