/**
 * The adapter to the hospital's standard message formats: FHIR R4 Bundles and HL7 v2 ORU^R01 in, a FHIR R4
 * Bundle out. The only package that touches the HAPI libraries (ArchitectureTest); the command line loads it only
 * for {@code labs import} and {@code export fhir} (StartupLoadingTest). Parsing and writing are HAPI's; what a
 * result means is decided by the pure {@code labs} package.
 */
package org.stasissheet.interop;
