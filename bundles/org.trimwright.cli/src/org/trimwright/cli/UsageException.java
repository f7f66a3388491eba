package org.trimwright.cli;

/** Bad command-line usage: the message says what is wrong and with which option or value. */
final class UsageException extends RuntimeException {

    private static final long serialVersionUID = 1L;

    UsageException(String message) {
        super(message);
    }
}
