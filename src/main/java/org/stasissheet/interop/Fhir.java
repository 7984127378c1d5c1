package org.stasissheet.interop;

import ca.uhn.fhir.context.FhirContext;
import ca.uhn.fhir.parser.IParser;
import ca.uhn.fhir.parser.LenientErrorHandler;

/** The one FHIR R4 context (costly to build, safe to share) and parsers that never log what they read. */
final class Fhir {
    private Fhir() {
    }

    private static final class Holder {
        static final FhirContext R4 = FhirContext.forR4();
    }

    static FhirContext context() {
        return Holder.R4;
    }

    /** A JSON parser whose complaints are not logged (they could quote a value); strict errors still throw. */
    static IParser json() {
        return context().newJsonParser().setParserErrorHandler(new LenientErrorHandler(false));
    }
}
