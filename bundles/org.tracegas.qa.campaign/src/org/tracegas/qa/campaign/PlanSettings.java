package org.tracegas.qa.campaign;

import java.io.IOException;
import java.time.Duration;
import java.util.List;

import org.tracegas.method.KeyValueFile;
import org.tracegas.qa.checks.QaSettings;

/** The head of a QA plan file as the settings its checks read; errors name the file, line and key. */
final class PlanSettings implements QaSettings {

    private final KeyValueFile.Section head;

    PlanSettings(KeyValueFile.Section head) {
        this.head = head;
    }

    @Override
    public boolean has(String key) {
        return head.has(key);
    }

    @Override
    public String text(String key) throws IOException {
        return head.text(key);
    }

    @Override
    public double number(String key) throws IOException {
        return head.number(key);
    }

    @Override
    public List<String> words(String key) throws IOException {
        return head.value(key).words();
    }

    @Override
    public double[] range(String key) throws IOException {
        return head.value(key).range();
    }

    @Override
    public Duration duration(String key) throws IOException {
        return head.value(key).duration();
    }
}
