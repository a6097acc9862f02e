package site

import (
	"fmt"
	"math"
	"sort"
	"strconv"
	"strings"

	"go.yaml.in/yaml/v3"
)

// node is a YAML node with its key path, so that every error can name the
// file, the line and the key. Decoding is strict: a mapping may hold only
// the keys its reader asks for.
type node struct {
	file string
	path string
	n    *yaml.Node
	line int // line of the node's key, where it has one
}

// errf reports a problem with d at the line of its key (a block mapping's
// content starts on the line after its key, which is not where a reader
// looks), or of the node itself.
func (d node) errf(format string, a ...any) *Error {
	line := d.line
	if line == 0 && d.n != nil {
		line = d.n.Line
	}
	col := 0
	if d.n != nil && (d.line == 0 || d.line == d.n.Line) {
		col = d.n.Column
	}
	return &Error{File: d.file, Line: line, Column: col, Key: d.path, Err: ErrInvalid, Msg: fmt.Sprintf(format, a...)}
}

func (d node) child(key *yaml.Node, n *yaml.Node) node {
	p := key.Value
	if d.path != "" {
		p = d.path + "." + key.Value
	}
	return node{file: d.file, path: p, n: resolveAlias(n), line: key.Line}
}

func resolveAlias(n *yaml.Node) *yaml.Node {
	for n != nil && n.Kind == yaml.AliasNode {
		n = n.Alias
	}
	return n
}

// fields is a mapping whose keys have been checked against a list.
type fields struct {
	parent node
	vals   map[string]node
	keys   map[string]*yaml.Node // key nodes, for "missing/conflicting" lines
}

// mapping checks that d is a mapping with keys only from allowed.
func (d node) mapping(allowed ...string) (*fields, error) {
	if d.n == nil || d.n.Kind != yaml.MappingNode {
		return nil, d.errf("want a mapping of keys (%s), got %s", strings.Join(allowed, ", "), kindName(d.n)).is(ErrType)
	}
	f := &fields{parent: d, vals: map[string]node{}, keys: map[string]*yaml.Node{}}
	for i := 0; i+1 < len(d.n.Content); i += 2 {
		k, v := d.n.Content[i], d.n.Content[i+1]
		name := k.Value
		ok := false
		for _, a := range allowed {
			if a == name {
				ok = true
				break
			}
		}
		kd := d.child(k, v)
		if !ok {
			msg := fmt.Sprintf("unknown key %s; allowed here: %s", Quote(name), strings.Join(allowed, ", "))
			if s := suggest(name, allowed); s != "" {
				msg = fmt.Sprintf("unknown key %s (did you mean %q?); allowed here: %s", Quote(name), s, strings.Join(allowed, ", "))
			}
			return nil, kd.errf("%s", msg).is(ErrUnknownKey)
		}
		if prev, dup := f.keys[name]; dup {
			return nil, kd.errf("this key is given twice (first at line %d)", prev.Line).is(ErrDuplicate)
		}
		f.vals[name] = kd
		f.keys[name] = k
	}
	return f, nil
}

func kindName(n *yaml.Node) string {
	if n == nil {
		return "nothing"
	}
	switch n.Kind {
	case yaml.MappingNode:
		return "a mapping"
	case yaml.SequenceNode:
		return "a list"
	case yaml.ScalarNode:
		if n.Tag == "!!null" {
			return "an empty value"
		}
		return Quote(n.Value)
	}
	return "something else"
}

// suggest returns the allowed key that name begins, or the one closest to
// it by edit distance when that is close.
func suggest(name string, allowed []string) string {
	best, bd := "", 3
	lower := strings.ToLower(name)
	for _, a := range allowed { // a key cut short, e.g. lateral for lateral_limit
		if len(lower) >= 4 && strings.HasPrefix(a, lower) {
			return a
		}
	}
	for _, a := range allowed {
		if d := editDistance(strings.ToLower(name), a); d < bd {
			best, bd = a, d
		}
	}
	return best
}

// editDistance is the optimal-string-alignment distance between a and b:
// insertions, deletions, substitutions and swaps of neighbouring letters
// count one each ("depht" is one from "depth").
func editDistance(a, b string) int {
	rows := [3][]int{make([]int, len(b)+1), make([]int, len(b)+1), make([]int, len(b)+1)}
	pp, prev, cur := rows[0], rows[1], rows[2]
	for j := range prev {
		prev[j] = j
	}
	for i := 1; i <= len(a); i++ {
		cur[0] = i
		for j := 1; j <= len(b); j++ {
			c := 1
			if a[i-1] == b[j-1] {
				c = 0
			}
			cur[j] = min(prev[j]+1, cur[j-1]+1, prev[j-1]+c)
			if i > 1 && j > 1 && a[i-1] == b[j-2] && a[i-2] == b[j-1] {
				cur[j] = min(cur[j], pp[j-2]+1)
			}
		}
		pp, prev, cur = prev, cur, pp
	}
	return prev[len(b)]
}

func (f *fields) has(key string) bool { _, ok := f.vals[key]; return ok }

func (f *fields) get(key string) (node, bool) { v, ok := f.vals[key]; return v, ok }

// names lists the present keys among candidates, sorted.
func (f *fields) present(candidates ...string) []string {
	var out []string
	for _, c := range candidates {
		if f.has(c) {
			out = append(out, c)
		}
	}
	sort.Strings(out)
	return out
}

func (f *fields) missing(key, why string) *Error {
	return f.parent.errf("missing required key %q%s", key, why).is(ErrMissing)
}

// number reads a decimal number (ParseNumber).
func (d node) number() (float64, error) {
	if d.n == nil || d.n.Kind != yaml.ScalarNode || d.n.Tag == "!!null" {
		return 0, d.errf("want a number, got %s", kindName(d.n)).is(ErrNotNumber)
	}
	v, ok := ParseNumber(d.n.Value)
	if !ok {
		return 0, d.errf("want a decimal number such as 12.5 or 1.2e3, got %s", Quote(d.n.Value)).is(ErrNotNumber)
	}
	return v, nil
}

// interval is a range check: [lo, hi] or open ends by flags.
type interval struct {
	lo, hi         float64
	openLo, openHi bool
	unit           string
}

func (iv interval) String() string {
	l, r := "[", "]"
	if iv.openLo {
		l = "("
	}
	if iv.openHi {
		r = ")"
	}
	hi := strconv.FormatFloat(iv.hi, 'g', -1, 64)
	if math.IsInf(iv.hi, 1) {
		hi = "∞"
	}
	s := fmt.Sprintf("%s%s, %s%s", l, strconv.FormatFloat(iv.lo, 'g', -1, 64), hi, r)
	if iv.unit != "" {
		s += " " + iv.unit
	}
	return s
}

func (iv interval) contains(v float64) bool {
	if v < iv.lo || v > iv.hi || (iv.openLo && v == iv.lo) || (iv.openHi && v == iv.hi) {
		return false
	}
	return true
}

var (
	positive    = interval{lo: 0, hi: math.Inf(1), openLo: true, openHi: true}
	nonNegative = interval{lo: 0, hi: math.Inf(1), openHi: true}
	depthRange  = interval{lo: 0, hi: MaxDepth, unit: "m"}
	stressRange = interval{lo: 0, hi: MaxStress, unit: "MPa"}
)

func unit(iv interval, u string) interval { iv.unit = u; return iv }

// numberIn reads a finite number within iv.
func (d node) numberIn(iv interval) (float64, error) {
	v, err := d.number()
	if err != nil {
		return 0, err
	}
	if !iv.contains(v) {
		return 0, d.errf("%s is outside the allowed range %s", strings.TrimSpace(d.n.Value), iv).is(ErrRange)
	}
	return v, nil
}

// text reads a one-line text value: no control characters, tabs or line
// breaks (a name, a path, a choice).
func (d node) text() (string, error) { return d.textOf(false) }

// freeText reads a text value that may hold tabs and line breaks (source:).
func (d node) freeText() (string, error) { return d.textOf(true) }

func (d node) textOf(breaks bool) (string, error) {
	if d.n == nil || d.n.Kind != yaml.ScalarNode || d.n.Tag == "!!null" {
		return "", d.errf("want text, got %s", kindName(d.n)).is(ErrType)
	}
	if i := badText(d.n.Value, breaks); i >= 0 {
		return "", d.errf("%s: %s", Quote(d.n.Value), textProblem(d.n.Value, i)).is(ErrEncoding)
	}
	return d.n.Value, nil
}

func (d node) boolean() (bool, error) {
	if d.n == nil || d.n.Kind != yaml.ScalarNode || d.n.Tag != "!!bool" {
		return false, d.errf("want true or false, got %s", kindName(d.n)).is(ErrType)
	}
	return d.n.Value == "true" || d.n.Value == "True" || d.n.Value == "TRUE", nil
}

func (d node) oneOf(choices ...string) (string, error) {
	s, err := d.text()
	if err != nil {
		return "", err
	}
	for _, c := range choices {
		if s == c {
			return s, nil
		}
	}
	return "", d.errf("%s is not one of: %s", Quote(s), strings.Join(choices, ", ")).is(ErrRange)
}

func (d node) list() ([]node, error) {
	if d.n == nil || d.n.Kind != yaml.SequenceNode {
		return nil, d.errf("want a list, got %s", kindName(d.n)).is(ErrType)
	}
	out := make([]node, len(d.n.Content))
	for i, c := range d.n.Content {
		out[i] = node{file: d.file, path: fmt.Sprintf("%s[%d]", d.path, i), n: resolveAlias(c)}
	}
	return out, nil
}

// optNumber reads key if present, else returns def and false.
func (f *fields) optNumber(key string, iv interval, def float64) (float64, bool, error) {
	v, ok := f.get(key)
	if !ok {
		return def, false, nil
	}
	x, err := v.numberIn(iv)
	return x, true, err
}

// source reads the optional free-text source: key.
func (f *fields) source() (string, error) {
	v, ok := f.get("source")
	if !ok {
		return "", nil
	}
	return v.freeText()
}
