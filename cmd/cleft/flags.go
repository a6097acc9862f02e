package main

import (
	"fmt"
	"strconv"
	"strings"

	"cleft/planes/site"

	"github.com/spf13/pflag"
)

// floatFlag is a number flag read as a decimal (site.ParseNumber): no
// hexadecimal, Inf or NaN, so that a non-finite value is a usage error
// before anything runs. set says whether the flag was given.
type floatFlag struct {
	v   *float64
	set bool
}

func (f *floatFlag) String() string {
	if f.v == nil || *f.v != *f.v { // NaN: no default
		return ""
	}
	return strconv.FormatFloat(*f.v, 'g', -1, 64)
}

func (f *floatFlag) Set(s string) error {
	v, ok := site.ParseNumber(s)
	if !ok {
		return fmt.Errorf("want a decimal number such as 12.5")
	}
	*f.v, f.set = v, true
	return nil
}

func (f *floatFlag) Type() string { return "number" }

// floatVar defines a decimal number flag with a default value (NaN for
// none); the returned flag says whether it was given.
func floatVar(fs *pflag.FlagSet, p *float64, name string, value float64, usage string) *floatFlag {
	*p = value
	f := &floatFlag{v: p}
	fs.Var(f, name, usage)
	return f
}

// floatsFlag is a list of decimal numbers, given comma-separated or by
// repeating the flag.
type floatsFlag struct {
	v   *[]float64
	set bool
}

func (f *floatsFlag) String() string {
	var parts []string
	for _, x := range *f.v {
		parts = append(parts, strconv.FormatFloat(x, 'g', -1, 64))
	}
	return strings.Join(parts, ",")
}

func (f *floatsFlag) Set(s string) error {
	if !f.set {
		*f.v, f.set = nil, true
	}
	for _, part := range strings.Split(s, ",") {
		v, ok := site.ParseNumber(part)
		if !ok {
			return fmt.Errorf("%s: want decimal numbers such as 50,120", site.Quote(part))
		}
		if len(*f.v) == maxListFlag {
			return fmt.Errorf("more than %d values", maxListFlag)
		}
		*f.v = append(*f.v, v)
	}
	return nil
}

func (f *floatsFlag) Type() string { return "numbers" }

// maxListFlag is the most values a list flag takes.
const maxListFlag = 100

func floatsVar(fs *pflag.FlagSet, p *[]float64, name, usage string) {
	fs.Var(&floatsFlag{v: p}, name, usage)
}

// inRange is the usage error of flag name with value v outside [lo, hi],
// or nil.
func inRange(name string, v, lo, hi float64, unit string) error {
	if v >= lo && v <= hi {
		return nil
	}
	return usagef("--%s %g: want %g to %g%s", name, v, lo, hi, unit)
}

// uintFlag is a whole-number flag ≥ 0 read as decimal digits only.
type uintFlag struct{ v *uint64 }

func (f *uintFlag) String() string {
	if f.v == nil {
		return ""
	}
	return strconv.FormatUint(*f.v, 10)
}

func (f *uintFlag) Set(s string) error {
	v, err := strconv.ParseUint(strings.TrimSpace(s), 10, 64)
	if err != nil {
		return fmt.Errorf("want a whole number ≥ 0 such as 7")
	}
	*f.v = v
	return nil
}

func (f *uintFlag) Type() string { return "whole number" }

// uintVar defines a whole-number flag ≥ 0 with a default value.
func uintVar(fs *pflag.FlagSet, p *uint64, name string, value uint64, usage string) {
	*p = value
	fs.Var(&uintFlag{v: p}, name, usage)
}
