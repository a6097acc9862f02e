package main

import (
	"fmt"
	"io"
	"io/fs"
	"os"
	"path/filepath"

	"cleft/planes/site/demo"

	"github.com/spf13/cobra"
)

type exampleOptions struct {
	dir   string
	force bool
}

func newExampleCmd() *cobra.Command {
	var o exampleOptions
	c := &cobra.Command{
		Use:   "example DIR",
		Short: "Write the demo site file, planes table and readings to edit",
		Long: `example writes DIR/site.yaml, DIR/planes.csv and DIR/readings.csv, the invented demo site
that 'cleft assess --example' uses, as a starting point for your own site.
It does not overwrite existing files unless --force is given.`,
		Args: func(_ *cobra.Command, args []string) error {
			if len(args) != 1 {
				return usagef("want one folder, got %d arguments", len(args))
			}
			return nil
		},
		RunE: func(cmd *cobra.Command, args []string) error {
			o.dir = args[0]
			return runExample(o, cmd.OutOrStdout())
		},
	}
	c.Flags().BoolVar(&o.force, "force", false, "overwrite existing files")
	return c
}

func runExample(o exampleOptions, stdout io.Writer) error {
	names := []string{demo.Site, "planes.csv", "readings.csv"}
	if !o.force {
		for _, n := range names {
			p := filepath.Join(o.dir, n)
			if _, err := os.Stat(p); err == nil {
				return fmt.Errorf("%s exists: not overwritten (use --force)", p)
			}
		}
	}
	if err := os.MkdirAll(o.dir, 0o755); err != nil {
		return fmt.Errorf("%s: cannot create the folder: %w", o.dir, unwrapPath(err))
	}
	for _, n := range names {
		data, err := fs.ReadFile(demo.FS, n)
		if err != nil {
			return err
		}
		p := filepath.Join(o.dir, n)
		if err := writeFile(p, func(w io.Writer) error { _, err := w.Write(data); return err }); err != nil {
			return err
		}
		fmt.Fprintf(stdout, "wrote %s\n", p)
	}
	fmt.Fprintf(stdout, "Next: cleft assess %s --out results\n", filepath.Join(o.dir, demo.Site))
	return nil
}
