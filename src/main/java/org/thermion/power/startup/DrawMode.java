package org.thermion.power.startup;

/**
 * Which steady plate and bias draw a stage instance is taken to settle to once its cathode
 * emits: the larger of its output-low and output-high draws (a planning worst case), or
 * their mean (a machine whose outputs are high half the time).
 */
public enum DrawMode { HIGHEST, MEAN }
