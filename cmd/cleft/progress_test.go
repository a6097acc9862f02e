package main

import (
	"bytes"
	"os"
	"strings"
	"testing"
	"time"
)

func TestProgress(t *testing.T) {
	t.Run("not a terminal", func(t *testing.T) {
		var b bytes.Buffer
		if p := startProgress(&b); p != nil {
			t.Fatal("a bar for a buffer")
		}
		f, err := os.CreateTemp(t.TempDir(), "stderr")
		if err != nil {
			t.Fatal(err)
		}
		defer f.Close()
		if p := startProgress(f); p != nil {
			t.Fatal("a bar for a file")
		}
		var p *progress // a nil bar draws nothing and does not panic
		p.set("grouping", 1, 2)
		p.finish()
	})
	t.Run("short run", func(t *testing.T) {
		var b bytes.Buffer
		p := newProgress(&b, time.Hour)
		p.set("grouping", 3, 12)
		p.finish()
		p.show() // the timer firing late draws nothing
		if b.Len() != 0 {
			t.Errorf("a run that ended before the delay drew %q", b.String())
		}
	})
	t.Run("long run", func(t *testing.T) {
		var b bytes.Buffer
		p := newProgress(&b, time.Hour)
		p.set("grouping", 3, 12)
		p.show() // as the timer does after the delay
		p.finish()
		out := b.String()
		if !strings.Contains(out, "grouping") || !strings.Contains(out, "3/12") {
			t.Errorf("bar %q lacks the stage and the count", out)
		}
	})
}
