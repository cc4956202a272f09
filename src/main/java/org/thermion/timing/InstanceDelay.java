package org.thermion.timing;

/** One stage instance's delay for the report: a gate or latch, its stage, module and output net. */
public record InstanceDelay(String kind, int index, String stage, String module, String netName, StageDelay delay) {
}
