package main

import (
	"bytes"
	"encoding/json"
	"io"
	"io/fs"
	"os"
)

// fsDir is a site rule pack directory.
type fsDir string

func toFS(dirs []fsDir) []fs.FS {
	out := make([]fs.FS, len(dirs))
	for i, d := range dirs {
		out[i] = os.DirFS(string(d))
	}
	return out
}

func indentJSON(w io.Writer, data []byte) error {
	var buf bytes.Buffer
	if err := json.Indent(&buf, data, "", "  "); err != nil {
		return err
	}
	buf.WriteByte('\n')
	_, err := w.Write(buf.Bytes())
	return err
}
