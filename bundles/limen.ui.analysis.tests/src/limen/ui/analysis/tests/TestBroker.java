package limen.ui.analysis.tests;

import java.util.ArrayList;
import java.util.HashMap;
import java.util.List;
import java.util.Map;
import java.util.function.Consumer;

import org.eclipse.e4.core.services.events.IEventBroker;
import org.osgi.service.event.EventHandler;

/**
 * A synchronous stand-in for the workbench's event broker: the tests wire the views together the way the
 * workbench's {@code @UIEventTopic} injection does, without a running workbench.
 */
final class TestBroker implements IEventBroker {

    private final Map<String, List<Consumer<Object>>> subscribers = new HashMap<>();
    final List<String> posted = new ArrayList<>();

    void on(String topic, Consumer<Object> subscriber) {
        subscribers.computeIfAbsent(topic, t -> new ArrayList<>()).add(subscriber);
    }

    @Override
    public boolean send(String topic, Object data) {
        for (Consumer<Object> s : subscribers.getOrDefault(topic, List.of())) {
            s.accept(data);
        }
        return true;
    }

    @Override
    public boolean post(String topic, Object data) {
        posted.add(topic + ": " + data);
        return send(topic, data);
    }

    @Override
    public boolean subscribe(String topic, EventHandler eventHandler) {
        return false;
    }

    @Override
    public boolean subscribe(String topic, String filter, EventHandler eventHandler, boolean headers) {
        return false;
    }

    @Override
    public boolean unsubscribe(EventHandler eventHandler) {
        return false;
    }
}
