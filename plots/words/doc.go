// Package words puts cleft's typed results into words, in one place for the
// command line and the report: verdicts, failed conditions, modes, drive
// classes, spalling bands, arcs and stretches, and the summary sentences.
// Nothing here computes a verdict; it says what the libraries decided.
package words
