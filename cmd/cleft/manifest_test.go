package main

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"os"
	"path/filepath"
	"slices"
	"strings"
	"testing"
)

// manifestOf reads DIR/manifest.json.
func manifestOf(t *testing.T, dir string) manifestDoc {
	t.Helper()
	var m manifestDoc
	readJSON(t, filepath.Join(dir, manifestName), &m)
	return m
}

func sha(t *testing.T, path string) string {
	t.Helper()
	data, err := os.ReadFile(path)
	if err != nil {
		t.Fatal(err)
	}
	s := sha256.Sum256(data)
	return hex.EncodeToString(s[:])
}

func exists(path string) bool { _, err := os.Lstat(path); return err == nil }

func TestManifestListsEveryFileWritten(t *testing.T) {
	dir := t.TempDir()
	code, out, stderr := cleft(t, "", "assess", "--example", "--out", dir)
	if code != 0 {
		t.Fatalf("exit %d: %s", code, stderr)
	}
	m := manifestOf(t, dir)
	if m.Tool != "cleft" || m.Command != "assess" || m.Version != version {
		t.Errorf("manifest head %+v", m)
	}
	entries, _ := os.ReadDir(dir)
	var names []string
	for _, e := range entries {
		if e.Name() != manifestName {
			names = append(names, e.Name())
		}
	}
	if len(m.Files) != len(names) {
		t.Errorf("manifest lists %d files, the folder holds %d besides it", len(m.Files), len(names))
	}
	for _, f := range m.Files {
		if !slices.Contains(names, f.Name) {
			t.Errorf("manifest lists %s, which is not in the folder", f.Name)
			continue
		}
		if got := sha(t, filepath.Join(dir, f.Name)); got != f.SHA256 {
			t.Errorf("%s: manifest SHA-256 %s, file %s", f.Name, f.SHA256, got)
		}
		if !strings.Contains(out, f.Name) {
			t.Errorf("the printed list of files lacks %s", f.Name)
		}
	}
}

func TestSecondAssessRemovesOnlyItsOwnStaleFiles(t *testing.T) {
	// Issue 15: a second assess into the same folder, of a site without
	// tunnel:, leaves no tunnel file of the first behind, and never removes
	// a file it did not write.
	root := t.TempDir()
	site, out := filepath.Join(root, "site"), filepath.Join(root, "out")
	if code, _, stderr := cleft(t, "", "example", site); code != 0 {
		t.Fatalf("example: exit %d: %s", code, stderr)
	}
	yaml := filepath.Join(site, "site.yaml")
	if code, _, stderr := cleft(t, "", "assess", yaml, "--out", out); code != 0 {
		t.Fatalf("first assess: exit %d: %s", code, stderr)
	}
	tunnelFiles := append(tunnelFiles(), "chance-tunnel.csv")
	for _, f := range tunnelFiles {
		if !exists(filepath.Join(out, f)) {
			t.Fatalf("the first run did not write %s", f)
		}
	}
	// Files that are not cleft's: the user's own, one the user changed
	// since cleft wrote it, an input kept in the output folder, and
	// manifest entries that name them.
	user := map[string]string{"notes.txt": "my notes\n", "tunnel-mine.png": "not a png\n", "planes-copy.csv": ""}
	planesData, _ := os.ReadFile(filepath.Join(site, "planes.csv"))
	user["planes-copy.csv"] = string(planesData)
	for name, data := range user {
		if err := os.WriteFile(filepath.Join(out, name), []byte(data), 0o644); err != nil {
			t.Fatal(err)
		}
	}
	if err := os.WriteFile(filepath.Join(out, "wall.csv"), []byte("edited by hand\n"), 0o644); err != nil {
		t.Fatal(err)
	}
	m := manifestOf(t, out)
	for _, name := range []string{"notes.txt", "planes-copy.csv"} {
		m.Files = append(m.Files, manifestFile{Name: name, SHA256: sha(t, filepath.Join(out, name))})
	}
	m.Files = append(m.Files, manifestFile{Name: "../site/site.yaml", SHA256: sha(t, yaml)}, manifestFile{Name: "../site/planes.csv", SHA256: sha(t, filepath.Join(site, "planes.csv"))})
	data, _ := json.Marshal(m)
	if err := os.WriteFile(filepath.Join(out, manifestName), data, 0o644); err != nil {
		t.Fatal(err)
	}
	// The same site without its tunnel, with planes_file now the copy in
	// the output folder.
	src, _ := os.ReadFile(yaml)
	s := string(src)
	i, j := strings.Index(s, "\ntunnel:"), strings.Index(s, "\nreport:")
	if i < 0 || j < i {
		t.Fatal("the demo site.yaml has no tunnel: block before report:")
	}
	s = s[:i] + s[j:]
	s = strings.Replace(s, "planes_file: planes.csv", "planes_file: ../out/planes-copy.csv", 1)
	if err := os.WriteFile(yaml, []byte(s), 0o644); err != nil {
		t.Fatal(err)
	}
	code, stdout, stderr := cleft(t, "", "assess", yaml, "--out", out)
	if code != 0 {
		t.Fatalf("second assess: exit %d: %s", code, stderr)
	}
	for _, f := range tunnelFiles {
		switch gone := !exists(filepath.Join(out, f)); {
		case f == "wall.csv" && gone:
			t.Error("wall.csv, changed since cleft wrote it, was removed")
		case f != "wall.csv" && !gone:
			t.Errorf("%s of the first run is left behind", f)
		}
	}
	if !strings.Contains(stdout, "Removed ") || !strings.Contains(stdout, "stations.csv") || !strings.Contains(stdout, "Kept 1 file") || !strings.Contains(stdout, "wall.csv") {
		t.Errorf("the run does not say what it removed and kept:\n%s", stdout)
	}
	for name, data := range user {
		if got, err := os.ReadFile(filepath.Join(out, name)); err != nil || string(got) != data {
			t.Errorf("%s: %v, changed or removed", name, err)
		}
	}
	for _, f := range []string{"site.yaml", "planes.csv", "readings.csv"} {
		if !exists(filepath.Join(site, f)) {
			t.Errorf("the input %s was removed", f)
		}
	}
	for _, f := range manifestOf(t, out).Files {
		if slices.Contains(tunnelFiles, f.Name) {
			t.Errorf("the new manifest lists %s", f.Name)
		}
	}
	// A third run of the same site finds nothing to remove.
	if code, stdout, stderr := cleft(t, "", "assess", yaml, "--out", out); code != 0 || strings.Contains(stdout, "Removed ") || strings.Contains(stdout, "Kept ") {
		t.Errorf("third assess: exit %d, %s\n%s", code, stderr, stdout)
	}
	if !exists(filepath.Join(out, "wall.csv")) {
		t.Error("wall.csv, no longer in any manifest, was removed")
	}
}
