package main

import (
	"fmt"
	"strings"

	"cleft/planes/assess"
	"cleft/planes/decide"
	"cleft/plots/words"
)

// The look-first list: at most lookFirstN findings near or past their
// limits (and the first of each part of the site beyond them), at least
// lookFirstLeast whatever their standing.
const (
	lookFirstN     = 12
	lookFirstLeast = 3
)

// decision is the decision summary of a screened site: every finding
// ranked, the ones to look at first, and the slope and tunnel in numbers.
type decision struct {
	findings []decide.Finding
	top      []decide.Finding
	more     int
	slope    *decide.SlopeSummary  // nil without a slope
	tunnel   *decide.TunnelSummary // nil without a tunnel
}

// decide ranks the findings of a and its cases and Monte Carlo (ch may be
// nil).
func (a *screened) decide(ch *chances) *decision {
	in := decide.Screenings{A: a.Assessment, Slope: a.slope, Tunnel: a.tunnel}
	if ch != nil {
		in.Runs, in.Outcome = ch.runs, ch.out
	}
	d := &decision{findings: decide.Findings(in)}
	d.top, d.more = decide.Top(d.findings, lookFirstN, lookFirstLeast)
	if a.slope != nil {
		s := decide.SummariseSlope(a.Assessment, a.slope)
		d.slope = &s
	}
	if a.tunnel != nil {
		t := decide.SummariseTunnel(a.tunnel)
		d.tunnel = &t
	}
	return d
}

// lead are the summary's first sentences: what was screened, and the
// cases and Monte Carlo in brief.
func (d *decision) lead(f assess.Facts, ch *chances) []string {
	out := words.Screened(f, d.slope, d.tunnel)
	if ch != nil {
		out = append(out, words.ChanceOverview(ch.targets, ch.runs, ch.out)...)
	}
	return out
}

// print writes the decision summary: the lead, the ranked list and the
// frictional-limit check.
func (d *decision) print(b *strings.Builder, f assess.Facts, ch *chances) {
	for _, l := range d.lead(f, ch) {
		b.WriteString(words.Wrap(l, 88) + "\n")
	}
	b.WriteString("\nLook at these first:\n")
	if q := words.Quiet(d.top); q != "" {
		b.WriteString("    " + q + "\n")
	}
	for i, l := range words.LookFirst(d.top) {
		lead := fmt.Sprintf("%2d. ", i+1)
		b.WriteString(lead + strings.ReplaceAll(words.Wrap(l, 84), "\n", "\n    ") + "\n")
	}
	if m := words.More(d.more); m != "" {
		b.WriteString("    " + strings.ReplaceAll(words.Wrap(m, 84), "\n", "\n    ") + "\n")
	}
	b.WriteString("\n" + words.Wrap(words.Limit(f), 88) + "\n")
}

// printTidied says which files of an earlier run were removed, and which
// were kept because they changed since that run wrote them.
func printTidied(b *strings.Builder, removed, kept []string) {
	if len(removed) > 0 {
		fmt.Fprintf(b, "Removed %s that an earlier cleft assess wrote here and this run does not: %s.\n", words.Plural(len(removed), "file", "files"), strings.Join(removed, ", "))
	}
	if len(kept) > 0 {
		fmt.Fprintf(b, "Kept %s that an earlier cleft assess wrote here and this run does not, as %s changed since or %s an input: %s.\n", words.Plural(len(kept), "file", "files"),
			map[bool]string{true: "it", false: "they"}[len(kept) == 1], map[bool]string{true: "is", false: "are"}[len(kept) == 1], strings.Join(kept, ", "))
	}
}
