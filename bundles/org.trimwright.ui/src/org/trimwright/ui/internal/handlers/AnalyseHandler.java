package org.trimwright.ui.internal.handlers;

import org.eclipse.e4.core.di.annotations.Execute;
import org.eclipse.e4.core.services.events.IEventBroker;
import org.trimwright.ui.internal.Topics;

/** Runs the selected field's analysis (with its Monte Carlo) again. */
public class AnalyseHandler {

    @Execute
    void execute(IEventBroker broker) {
        broker.post(Topics.ANALYSE, Boolean.TRUE);
    }
}
