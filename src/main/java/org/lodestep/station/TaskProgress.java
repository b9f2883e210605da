package org.lodestep.station;

import org.lodestep.workflow.LeadsOnRig;
import org.lodestep.workflow.Progress;

/** A workflow's progress passed on to the task the page follows; rig listeners add their own events on top. */
interface TaskProgress extends Progress {
    Tasks.Task task();

    @Override
    default void step(String step) {
        task().step(step);
    }

    @Override
    default void advanced(long done, long total) {
        task().advanced(done, total);
    }

    @Override
    default void note(String message) {
        task().note(message);
    }

    /** Leads on the rig: progress to the task; a page overrides what it shows of each reading. */
    abstract class Leads implements LeadsOnRig.Listener, TaskProgress {
        private final Tasks.Task task;

        Leads(Tasks.Task task) {
            this.task = task;
        }

        @Override
        public Tasks.Task task() {
            return task;
        }
    }
}
