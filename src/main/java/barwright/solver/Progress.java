package barwright.solver;

import java.util.concurrent.CancellationException;

/**
 * How long work tells its caller how far it has come, and learns that it should stop. Implementations must
 * be safe to call from several threads at once: a parallel search reports from each of them.
 */
public interface Progress {
    /** Progress that nobody watches and that never cancels. */
    Progress NONE = new Progress() {
        @Override
        public void update(long done, long total) {
        }

        @Override
        public boolean isCancelled() {
            return false;
        }
    };

    /**
     * @param done  units of work finished so far
     * @param total units of work in all
     */
    void update(long done, long total);

    /** @return true once the caller wants the work stopped */
    boolean isCancelled();

    /** @throws CancellationException where the caller has asked to stop */
    default void checkCancelled() {
        if (isCancelled()) {
            throw new CancellationException("cancelled");
        }
    }
}
