package main

import (
	"errors"
	"fmt"
	"io"
	"os"
	"strings"

	"cleft/planes/site"
	"cleft/planes/site/demo"

	"github.com/spf13/cobra"
)

// version is the tool version shown by --version and in every output.
var version = "0.1.0"

// caution is printed by --help and by every command that reports results.
const caution = `Caution: cleft gives screening-level results from the stated inputs. Stress
and water estimates carry large uncertainty. It is not a substitute for site
investigation, engineering judgement, local codes and licensed practice.`

// usageError marks a mistake on the command line (exit status 2).
type usageError struct{ error }

func usagef(format string, a ...any) error { return usageError{fmt.Errorf(format, a...)} }

// run executes the command line and returns the exit status: 0, 1 for a
// runtime error (bad input file, failed write), 2 for a bad command line.
func run(args []string, stdin io.Reader, stdout, stderr io.Writer) int {
	started := false
	root := newRootCmd(stdin, stdout, stderr, &started)
	root.SetArgs(args)
	err := root.Execute()
	if err == nil {
		return 0
	}
	var ue usageError
	if errors.As(err, &ue) || !started {
		fmt.Fprintf(stderr, "cleft: %s\n", site.OneLine(err.Error()))
		name := "cleft"
		if c, _, ferr := root.Find(args); ferr == nil && c != root {
			name = c.CommandPath()
		}
		fmt.Fprintf(stderr, "Run '%s --help' for usage.\n", name)
		return 2
	}
	fmt.Fprintf(stderr, "cleft: %s\n", site.OneLine(err.Error()))
	return 1
}

func newRootCmd(stdin io.Reader, stdout, stderr io.Writer, started *bool) *cobra.Command {
	root := &cobra.Command{
		Use:   "cleft",
		Short: "Effective-stress screening of joints and faults in rock",
		Long: `cleft takes one site file — the in-situ stress model, the groundwater level,
the strength of the discontinuities and the mapped planes (dip / dip direction)
— and works out, for every plane, the normal and shear stress, slip and
dilation tendency, factor of safety, the rise in water pressure that would make
it slip, and the sense of slip; groups raw field readings into joint sets;
screens a cut slope (planar, wedge, toppling; planar and wedge factors of safety)
and a tunnel alignment (boundary stresses, joint slip at the wall); and writes
stereonets, Mohr diagrams, charts and a self-contained report.

Conventions: x north, y east, z down; compression positive; MPa; depths in m
below ground; angles in degrees, azimuths clockwise from north.

` + caution,
		Version:       version,
		SilenceErrors: true,
		SilenceUsage:  true,
		PersistentPreRun: func(*cobra.Command, []string) {
			*started = true
		},
	}
	root.SetIn(stdin)
	root.SetOut(stdout)
	root.SetErr(stderr)
	root.SetFlagErrorFunc(func(_ *cobra.Command, err error) error { return usageError{err} })
	root.AddCommand(
		newResolveCmd(),
		newStressCmd(),
		newAssessCmd(),
		newPlotCmd(),
		newSetsCmd(),
		newSlopeCmd(),
		newTunnelCmd(),
		newChanceCmd(),
		newExampleCmd(),
	)
	root.CompletionOptions.DisableDefaultCmd = true
	return root
}

// siteOrExample is the argument check of the commands that take a site file
// or --example.
func siteOrExample(example *bool) cobra.PositionalArgs {
	return func(cmd *cobra.Command, args []string) error {
		if *example {
			if len(args) > 0 {
				return usagef("give a site file or --example, not both")
			}
			return nil
		}
		return oneSite(cmd, args)
	}
}

// loadSite loads the site file at path, or the built-in demo.
func loadSite(example bool, path string) (*site.Site, error) {
	if example {
		return site.ParseFS(demo.FS, demo.Site)
	}
	return site.Load(path)
}

// makeDir creates an output folder.
func makeDir(dir string) error {
	if err := os.MkdirAll(dir, 0o755); err != nil {
		return fmt.Errorf("%s: cannot create the output folder: %w", dir, unwrapPath(err))
	}
	return nil
}

// oneSite is the argument check of the commands that take one site file.
func oneSite(_ *cobra.Command, args []string) error {
	switch len(args) {
	case 1:
		return nil
	case 0:
		return usagef("missing the site file: give SITE.yaml")
	}
	return usagef("want one site file, got %d arguments: %s", len(args), strings.Join(args, " "))
}
