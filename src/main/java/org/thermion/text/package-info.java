/** Wording shared by every package that writes for people: counted nouns. No logic of the machine. */
package org.thermion.text;
