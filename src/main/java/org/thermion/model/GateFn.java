package org.thermion.model;

/** The function a combinational cell computes over its inputs. */
public enum GateFn { AND, OR, NAND, NOR, XOR, NOT, BUF }
