package org.feedernote.model;

/** A basis value: what it is, whether the input gave it or the stated default applies, and its key path. */
public record Setting<T>(T value, boolean given, String path) {}
