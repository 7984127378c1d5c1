/**
 * Lab results from outside the form, turned into case values without guessing: pasted report text, one typed
 * value with its unit, and results already coded elsewhere (FHIR, HL7 v2, read by the {@code interop} adapter).
 * Pure: no files, no toolkit, no clock; every outcome says what was taken, what needs an answer, and what was
 * left out and why.
 */
package org.stasissheet.labs;
