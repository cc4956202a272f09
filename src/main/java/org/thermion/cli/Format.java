package org.thermion.cli;

/** Output formats for reports. */
public enum Format { text, csv, json }
