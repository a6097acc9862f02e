package main

import (
	"crypto/sha256"
	"encoding/hex"
	"encoding/json"
	"io"
	"os"
	"path/filepath"
	"slices"
)

// manifestName is the file in which assess lists what it wrote into its
// folder.
const manifestName = "manifest.json"

// maxManifest is the most bytes of an earlier manifest that are read: a
// larger file is not one that assess wrote.
const maxManifest = 1 << 20

// manifestDoc is manifest.json: every file the run wrote into the folder
// (the manifest aside), with its size and SHA-256.
type manifestDoc struct {
	Tool    string         `json:"tool"` // "cleft"
	Version string         `json:"version"`
	Command string         `json:"command"` // "assess"
	Files   []manifestFile `json:"files"`
}

type manifestFile struct {
	Name   string `json:"name"`
	Bytes  int64  `json:"bytes"`
	SHA256 string `json:"sha256"`
}

// hashFile returns the size and SHA-256 (hex) of the regular file at path;
// ok is false for anything else (a link, a folder, a missing file).
func hashFile(path string) (n int64, sum string, ok bool) {
	fi, err := os.Lstat(path)
	if err != nil || !fi.Mode().IsRegular() {
		return 0, "", false
	}
	f, err := os.Open(path)
	if err != nil {
		return 0, "", false
	}
	defer f.Close()
	h := sha256.New()
	if n, err = io.Copy(h, f); err != nil {
		return 0, "", false
	}
	return n, hex.EncodeToString(h.Sum(nil)), true
}

// readManifest returns the files of the folder's earlier manifest, or nil
// when there is none or it is not one that cleft assess wrote.
func readManifest(dir string) []manifestFile {
	f, err := os.Open(filepath.Join(dir, manifestName))
	if err != nil {
		return nil
	}
	defer f.Close()
	data, err := io.ReadAll(io.LimitReader(f, maxManifest+1))
	if err != nil || len(data) > maxManifest {
		return nil
	}
	var m manifestDoc
	if json.Unmarshal(data, &m) != nil || m.Tool != "cleft" || m.Command != "assess" {
		return nil
	}
	return m.Files
}

// manifest writes manifest.json into the folder, listing every file written
// so far with its SHA-256, and then removes the files of the folder's
// earlier manifest (written by an earlier assess) that this run did not
// write. A file is removed only when its name is one that assess writes, it
// is a regular file (not a link), it is none of inputs, and its content is
// still what the earlier manifest recorded; the others are kept, and
// returned in kept. Nothing that no manifest names is touched.
func (o *outputs) manifest(inputs []string) (removed, kept []string, err error) {
	old := readManifest(o.dir)
	m := manifestDoc{Tool: "cleft", Version: version, Command: "assess", Files: []manifestFile{}}
	written := map[string]bool{manifestName: true}
	for _, p := range o.wrote {
		name := filepath.Base(p)
		written[name] = true
		if n, sum, ok := hashFile(p); ok {
			m.Files = append(m.Files, manifestFile{Name: name, Bytes: n, SHA256: sum})
		}
	}
	if err := o.tables(namedTable{manifestName, func(w io.Writer) error { return writeJSON(w, m) }}); err != nil {
		return nil, nil, err
	}
	ours := assessFiles()
	for _, f := range old {
		if written[f.Name] || !slices.Contains(ours, f.Name) || filepath.Base(f.Name) != f.Name {
			continue
		}
		p := filepath.Join(o.dir, f.Name)
		if _, err := os.Lstat(p); err != nil {
			continue // gone already
		}
		_, sum, ok := hashFile(p)
		if !ok || sum != f.SHA256 || isInput(p, inputs) || os.Remove(p) != nil {
			kept = append(kept, f.Name)
			continue
		}
		removed = append(removed, f.Name)
	}
	return removed, kept, nil
}

// isInput reports whether path is, or links to, one of inputs.
func isInput(path string, inputs []string) bool {
	fi, err := os.Stat(path)
	if err != nil {
		return false
	}
	for _, in := range inputs {
		if in == "" || in == "-" {
			continue
		}
		if fo, err := os.Stat(in); err == nil && os.SameFile(fi, fo) {
			return true
		}
	}
	return false
}
