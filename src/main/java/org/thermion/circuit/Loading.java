package org.thermion.circuit;

/** The static bounds of a machine's load: every stage at its lightest or at its heaviest draw. */
public enum Loading { LIGHT, HEAVY }
