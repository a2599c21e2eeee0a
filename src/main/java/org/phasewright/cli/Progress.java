package org.phasewright.cli;

import java.util.Timer;
import java.util.TimerTask;
import me.tongfei.progressbar.ConsoleProgressBarConsumer;
import me.tongfei.progressbar.ProgressBar;
import me.tongfei.progressbar.ProgressBarBuilder;
import me.tongfei.progressbar.ProgressBarStyle;

/**
 * A progress bar on standard error that appears only when the work is still running after about
 * a second, only when standard error is a terminal ({@link System#console()} is present) and only
 * when the user did not ask for {@code --quiet}. Quick commands therefore print nothing extra, and
 * piped or captured output never holds bar characters.
 *
 * <p>Steps are counted by the caller ({@link #step(String)}); the bar, once shown, catches up to
 * the count. Thread-safe: a timer thread may show the bar while the caller steps.
 */
final class Progress implements AutoCloseable {
    private static final long DELAY_MS = 1000;

    private final String task;
    private final long total;
    private final Timer timer;
    private long done;
    private String detail = "";
    private ProgressBar bar;
    private boolean closed;

    private Progress(String task, long total, boolean enabled) {
        this.task = task;
        this.total = total;
        if (enabled) {
            timer = new Timer("phasewright-progress", true);
            timer.schedule(new TimerTask() {
                @Override
                public void run() {
                    show();
                }
            }, DELAY_MS);
        } else {
            timer = null;
        }
    }

    /** A progress display for {@code total} steps; silent unless stderr is a terminal and not quiet. */
    static Progress start(String task, long total, boolean quiet) {
        return new Progress(task, total, !quiet && System.console() != null);
    }

    /** One step done; {@code what} describes the step just finished (a file name, a stage). */
    synchronized void step(String what) {
        done++;
        detail = what == null ? "" : what;
        if (bar != null) {
            bar.stepTo(done);
            bar.setExtraMessage(detail);
        }
    }

    /** Progress reached {@code count} steps (for work measured in bytes or per mille, not in items). */
    synchronized void at(long count) {
        done = Math.max(done, Math.min(total, count));
        if (bar != null) {
            bar.stepTo(done);
        }
    }

    private synchronized void show() {
        if (closed || bar != null) {
            return;
        }
        bar = new ProgressBarBuilder()
                .setTaskName(task)
                .setInitialMax(total)
                .setStyle(ProgressBarStyle.ASCII)
                .setConsumer(new ConsoleProgressBarConsumer(System.err))
                .setUpdateIntervalMillis(200)
                .clearDisplayOnFinish()
                .build();
        bar.stepTo(done);
        bar.setExtraMessage(detail);
    }

    @Override
    public synchronized void close() {
        closed = true;
        if (timer != null) {
            timer.cancel();
        }
        if (bar != null) {
            bar.close();
            bar = null;
        }
    }
}
