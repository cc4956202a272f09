package org.thermion.model;

/** What a tube section is. */
public enum TubeKind { TRIODE, PENTODE, DIODE, THYRATRON }
