package org.phasewright.model;

/**
 * A numerical or modelling problem that stops a fit: rank deficiency, more columns than samples,
 * a term that cannot be estimated from the record. The message is one sentence for the user.
 */
public class ModelException extends RuntimeException {
    public ModelException(String message) {
        super(message);
    }
}
