package api

import (
	"bufio"
	"bytes"
	"encoding/csv"
	"encoding/json"
	"errors"
	"fmt"
	"io"
	"mime"
	"net/http"
	"reflect"
	"strconv"
	"strings"
	"sync"

	"colloidtriage/advisor/input"

	"github.com/labstack/echo/v4"
)

// csvDialect is a CSV file's field delimiter and decimal separator.
type csvDialect struct {
	delimiter, decimal rune
}

// delimiterName spells the delimiter as a media-type parameter value.
func (d csvDialect) delimiterName() string {
	if d.delimiter == '\t' {
		return "tab"
	}
	return string(d.delimiter)
}

// csvDialectOf reads the dialect from media-type parameters. With def nil
// (a request body) delimiter and decimal are required; otherwise (an Accept
// range) each missing one is taken from def.
func csvDialectOf(params map[string]string, def *csvDialect) (csvDialect, error) {
	bad := func(detail string) (csvDialect, error) {
		return csvDialect{}, fail(csvMediaType,
			detail+`; declare it as text/csv; header=present; delimiter=";"; decimal=","`)
	}
	var d csvDialect
	if def != nil {
		d = *def
	}
	switch v, ok := params["delimiter"]; {
	case !ok && def == nil:
		return bad("the delimiter parameter is missing")
	case !ok:
	case v == ",", v == ";":
		d.delimiter = rune(v[0])
	case v == "tab", v == "\t":
		d.delimiter = '\t'
	default:
		return bad(fmt.Sprintf("delimiter %q is not one of \",\", \";\", \"tab\"", v))
	}
	switch v, ok := params["decimal"]; {
	case !ok && def == nil:
		return bad("the decimal parameter is missing")
	case !ok:
	case v == ".", v == ",":
		d.decimal = rune(v[0])
	default:
		return bad(fmt.Sprintf("decimal %q is not \".\" or \",\"", v))
	}
	if d.delimiter == d.decimal {
		return bad("the delimiter and the decimal separator are the same character")
	}
	if h, ok := params["header"]; ok && !strings.EqualFold(h, "present") {
		return bad("header=" + h + " is not supported: the first row must name the columns (header=present)")
	}
	if cs, ok := params["charset"]; ok && !strings.EqualFold(cs, "utf-8") {
		return bad("charset " + cs + " is not supported: send UTF-8")
	}
	return d, nil
}

// csvColumn is one addressable leaf of the sample: its path from the root
// of the JSON form and its contract (the kind its cells are read as, and
// its unit).
type csvColumn struct {
	path []pathStep
	leaf *node
}

// pathStep is a member name, or an array index when isIndex.
type pathStep struct {
	name    string
	index   int
	isIndex bool
}

// csvColumns maps every column name to its leaf, read from the sample's
// contract, so the CSV contract follows the JSON one without a second list
// to keep in step.
var csvColumns = sync.OnceValue(func() map[string]csvColumn {
	out := map[string]csvColumn{}
	addColumns(out, contractOf(reflect.TypeOf(input.Sample{})), "", nil)
	return out
})

func addColumns(out map[string]csvColumn, n *node, column string, path []pathStep) {
	join := func(name string) string {
		if column == "" {
			return name
		}
		return column + "." + name
	}
	step := func(s pathStep) []pathStep { return append(path[:len(path):len(path)], s) }
	switch n.kind {
	case reflect.Struct:
		for _, name := range n.names {
			addColumns(out, n.members[name], join(name), step(pathStep{name: name}))
		}
	case reflect.Slice:
		// Only arrays of objects with an item limit are addressable, so a
		// header can never ask for an unbounded array.
		if n.elem.kind != reflect.Struct {
			return
		}
		for i := range n.maxItems() {
			addColumns(out, n.elem, join(strconv.Itoa(i)), step(pathStep{index: i, isIndex: true}))
		}
	case reflect.String, reflect.Float64, reflect.Int, reflect.Bool:
		out[column] = csvColumn{path: path, leaf: n}
	}
}

// csvEntries reads a CSV batch into entries: the header is checked whole,
// then each row becomes one sample's JSON form or that row's problem.
// Reading stops at the first row past maxBatchSamples, which refuses the
// batch (413); a header wider than the sample's fields is refused (400)
// before it is split.
//
// A batch may be sent as CSV (RFC 4180) with a header row. The dialect is
// never guessed: the Content-Type must declare it,
//
//	Content-Type: text/csv; header=present; delimiter=";"; decimal=","
//
//	delimiter  required: "," or ";" or "tab"
//	decimal    required: "." or ","; must differ from the delimiter
//	header     optional: "present"; "absent" is refused (the header names the columns)
//	charset    optional: "utf-8"; no other is read (a leading BOM is dropped)
//
// Each header cell is the dotted path of one leaf of the sample's JSON form,
// array elements by 0-based index, spelled exactly as in JSON (units in the
// names):
//
//	sample_id;symptom;particles.material;particles.diameter_nm;particles.zeta_mV;medium.electrolytes.0.formula;medium.electrolytes.0.concentration_mM
//
// Every leaf of input.Sample is a column (testdata/batch/README.md lists
// them); an index may go up to the array's item limit less one. A header
// with an unknown, repeated or empty column is refused whole (400) before
// any row is read, and so is a body that does not parse as CSV.
//
// Each row is one sample. An empty cell means "not given". A cell is read
// by the Go type of its field: numbers with the declared decimal separator,
// an optional sign and exponent and no thousands separator ("1,5" and
// "2,5e3" with decimal=","; "1.234,5" is refused), whole numbers for
// valences, true or false for flags, text as written (surrounding spaces
// trimmed). The row is then assembled into the sample's JSON form and goes
// down the same strict decode and validation path as POST /v1/triage. A
// cell that does not parse, or a row with more or fewer fields than the
// header, fails that row only. Rows whose cells are all empty are skipped.
//
// Pointers in a CSV item's problem name the cell as /rows/<n>/<column>,
// where n is the item's index (0-based, header and skipped rows not
// counted) and the item's line is the row's line in the file.
//
// With "Accept: text/csv" the answer is CSV too, one row per sample in the
// order sent, in the request's dialect unless the Accept range declares its
// own, with the columns of csvAnswerHeader.
func csvEntries(body []byte, d csvDialect) ([]batchEntry, error) {
	rs := csvRecords{body: body, delim: byte(d.delimiter)}
	known := csvColumns()
	header, _, width, err := rs.next(len(known))
	if err != nil {
		return nil, err
	}
	if header == nil && width == 0 {
		return nil, fail(csvEmpty,
			"the first row must be the header naming the columns")
	}
	if len(header) == 0 {
		return nil, fail(csvHeaderInvalid, fmt.Sprintf(
			"the header has %d columns; a sample has %d fields, so no header has more; no row was read", width, len(known)))
	}
	cols, idCol, err := csvHeader(header)
	if err != nil {
		return nil, err
	}
	var entries []batchEntry
	for {
		rec, line, width, err := rs.next(len(cols))
		if err != nil {
			return nil, err
		}
		if rec == nil && width == 0 {
			return entries, nil
		}
		if rec != nil && allEmpty(rec) {
			continue
		}
		if len(entries) == maxBatchSamples {
			return nil, tooManySamples()
		}
		e := batchEntry{line: line}
		if idCol >= 0 && idCol < len(rec) {
			if id := strings.TrimSpace(rec[idCol]); len(id) <= maxSampleID {
				e.sampleID = id
			}
		}
		if width != len(cols) {
			e.err = fail(csvRowLength,
				fmt.Sprintf("line %d has %d fields; the header has %d columns", line, width, len(cols)),
				input.FieldProblem{Pointer: "", Reason: "wrong number of fields"})
		} else {
			e.raw, e.err = csvSample(cols, rec, d)
		}
		entries = append(entries, e)
	}
}

// csvRecords reads a CSV body one record at a time. Each record's fields
// are counted before it is split, so that a record wider than the caller
// can use is never split at all: an 8 MB line of delimiters costs no
// memory beyond the body.
type csvRecords struct {
	body  []byte
	delim byte
	off   int // where the next record starts
	line  int // the line of the body at off, 0-based
	buf   *bufio.Reader
}

// next returns the next non-blank record, the line where it starts and
// its number of fields. A record of more than maxWidth fields is not split:
// it is returned as nil, or as no fields when all of it is delimiters and
// spaces (a blank row), with its width. At the end of the body record is
// nil and width 0.
func (rs *csvRecords) next(maxWidth int) (record []string, line, width int, err error) {
	for rs.off < len(rs.body) {
		start, startLine := rs.off, rs.line+1
		end, fields, lines := csvSpan(rs.body, rs.off, rs.delim)
		rs.off, rs.line = end, rs.line+lines
		span := rs.body[start:end]
		if fields > maxWidth {
			if len(bytes.Trim(span, " \t\r\n"+string(rs.delim))) == 0 {
				return []string{}, startLine, fields, nil
			}
			return nil, startLine, fields, nil
		}
		if rs.buf == nil {
			rs.buf = bufio.NewReader(bytes.NewReader(span))
		} else {
			rs.buf.Reset(bytes.NewReader(span))
		}
		r := csv.NewReader(rs.buf) // reuses rs.buf: no buffer per record
		r.Comma = rune(rs.delim)
		r.FieldsPerRecord = -1
		rec, err := r.Read()
		if errors.Is(err, io.EOF) {
			continue // a blank line
		}
		if err == nil {
			_, err = r.Read()
			if errors.Is(err, io.EOF) {
				err = nil
			} else if err == nil {
				err = &csv.ParseError{Line: lines, Column: 1, Err: csv.ErrQuote}
			}
		}
		if err != nil {
			return nil, 0, 0, csvSyntaxProblem(err, startLine-1)
		}
		return rec, startLine, len(rec), nil
	}
	return nil, 0, 0, nil
}

// csvSpan finds the end of the record that starts at off (just past its
// line break) and counts its fields and lines as encoding/csv reads them: a
// field that starts with a quote runs to the closing quote, delimiters and
// line breaks inside it included, and "" is a quote inside it.
func csvSpan(b []byte, off int, delim byte) (end, fields, lines int) {
	fields, lines = 1, 1
	quoted, fieldStart := false, true
	for i := off; i < len(b); i++ {
		c := b[i]
		switch {
		case quoted && c == '"' && i+1 < len(b) && b[i+1] == '"':
			i++
		case quoted && c == '"':
			quoted = false
		case quoted && c == '\n':
			lines++
		case quoted:
		case c == '"' && fieldStart:
			quoted = true
		case c == delim:
			fields++
			fieldStart = true
			continue
		case c == '\n':
			return i + 1, fields, lines
		}
		fieldStart = false
	}
	return len(b), fields, lines
}

// csvHeader resolves the header's columns and the index of sample_id (-1
// when absent). Every unknown, repeated or empty name is reported at once.
func csvHeader(header []string) ([]csvColumn, int, error) {
	known := csvColumns()
	cols := make([]csvColumn, len(header))
	seen := map[string]bool{}
	idCol := -1
	var problems []input.FieldProblem
	for j, name := range header {
		name = strings.TrimSpace(name)
		ptr := "/header/" + strconv.Itoa(j)
		col, ok := known[name]
		switch {
		case name == "":
			problems = append(problems, input.FieldProblem{Pointer: ptr, Reason: "empty column name"})
		case seen[name]:
			problems = append(problems, input.FieldProblem{Pointer: ptr, Reason: fmt.Sprintf("column %q appears twice", name)})
		case !ok:
			problems = append(problems, input.FieldProblem{Pointer: ptr, Reason: unknownColumn(name, known),
				Valid: "the dotted path of a sample field, e.g. particles.diameter_nm or medium.electrolytes.0.formula"})
		}
		seen[name] = true
		cols[j] = col
		if name == "sample_id" {
			idCol = j
		}
	}
	if len(problems) > 0 {
		return nil, 0, fail(csvHeaderInvalid,
			"no row was read; columns are the JSON fields of a sample as dotted paths (see /openapi.json)", problems...)
	}
	return cols, idCol, nil
}

// unknownColumn explains an unknown column, suggesting the column that
// differs only in case (units such as mV and mPa_s are case-sensitive).
func unknownColumn(name string, known map[string]csvColumn) string {
	for k := range known {
		if strings.EqualFold(k, name) {
			return fmt.Sprintf("unknown column %q; did you mean %q?", name, k)
		}
	}
	return fmt.Sprintf("unknown column %q", name)
}

// csvSyntaxProblem explains a parse error of a record that starts after
// line before.
func csvSyntaxProblem(err error, before int) error {
	detail := "the body does not parse as CSV with the declared delimiter"
	var pe *csv.ParseError
	if errors.As(err, &pe) {
		detail = fmt.Sprintf("line %d, column %d: %v", before+pe.Line, pe.Column, pe.Err)
	}
	return fail(csvSyntax, detail)
}

func allEmpty(rec []string) bool {
	for _, cell := range rec {
		if strings.TrimSpace(cell) != "" {
			return false
		}
	}
	return true
}

// csvSample assembles one row into the sample's JSON form. Every cell that
// does not parse is reported, with its pointer relative to the sample.
func csvSample(cols []csvColumn, rec []string, d csvDialect) ([]byte, error) {
	root := map[string]any{}
	var problems []input.FieldProblem
	for j, cell := range rec {
		cell = strings.TrimSpace(cell)
		if cell == "" {
			continue
		}
		v, reason := parseCell(cell, cols[j].leaf.kind, d)
		if reason != "" {
			problems = append(problems, input.FieldProblem{Pointer: jsonPointer(cols[j].path), Reason: reason, Unit: cols[j].leaf.unit})
			continue
		}
		setPath(root, cols[j].path, v)
	}
	if len(problems) > 0 {
		return nil, fail(csvCellInvalid,
			fmt.Sprintf("%d cell(s) are not of their column's type", len(problems)), problems...)
	}
	return json.Marshal(root)
}

func jsonPointer(path []pathStep) string {
	var b strings.Builder
	for _, s := range path {
		b.WriteByte('/')
		if s.isIndex {
			b.WriteString(strconv.Itoa(s.index))
		} else {
			b.WriteString(s.name)
		}
	}
	return b.String()
}

// csvPointer turns a pointer inside row index's sample into the cell's
// pointer /rows/<index>/<column>; the column is the dotted path.
func csvPointer(index int, pointer string) string {
	p := "/rows/" + strconv.Itoa(index)
	if pointer != "" {
		p += "/" + strings.ReplaceAll(strings.TrimPrefix(pointer, "/"), "/", ".")
	}
	return p
}

// setPath sets v at path in the JSON object obj, creating the objects and
// arrays on the way. Array elements skipped over become empty objects, so
// that validation names their missing fields at their own index.
func setPath(obj map[string]any, path []pathStep, v any) {
	name := path[0].name
	switch {
	case len(path) == 1:
		obj[name] = v
	case path[1].isIndex:
		arr, _ := obj[name].([]any)
		for len(arr) <= path[1].index {
			arr = append(arr, map[string]any{})
		}
		obj[name] = arr
		setPath(arr[path[1].index].(map[string]any), path[2:], v)
	default:
		child, ok := obj[name].(map[string]any)
		if !ok {
			child = map[string]any{}
			obj[name] = child
		}
		setPath(child, path[1:], v)
	}
}

// parseCell reads a non-empty cell as kind, or says why it cannot.
func parseCell(cell string, kind reflect.Kind, d csvDialect) (any, string) {
	switch kind {
	case reflect.Float64:
		return parseDecimal(cell, d.decimal)
	case reflect.Int:
		n, err := strconv.ParseInt(cell, 10, 64)
		if err != nil {
			return nil, fmt.Sprintf("%q is not a whole number", cell)
		}
		return n, ""
	case reflect.Bool:
		b, err := strconv.ParseBool(cell)
		if err != nil {
			return nil, fmt.Sprintf("%q is not true or false", cell)
		}
		return b, ""
	}
	return cell, ""
}

// parseDecimal reads [sign] digits [decimal digits] [e [sign] digits] with
// the declared decimal separator and nothing else: no thousands separator,
// no other separator, no NaN or infinity. Accepting either separator would
// read "1,234" as 1.234 in one file and 1234 in another.
func parseDecimal(s string, decimal rune) (any, string) {
	sep := byte(decimal)
	i := 0
	if i < len(s) && (s[i] == '+' || s[i] == '-') {
		i++
	}
	whole := countDigits(s[i:])
	i += whole
	frac := 0
	if i < len(s) && s[i] == sep {
		i++
		frac = countDigits(s[i:])
		i += frac
	}
	ok := whole+frac > 0
	if ok && i < len(s) && (s[i] == 'e' || s[i] == 'E') {
		i++
		if i < len(s) && (s[i] == '+' || s[i] == '-') {
			i++
		}
		exp := countDigits(s[i:])
		ok = exp > 0
		i += exp
	}
	if !ok || i != len(s) {
		return nil, fmt.Sprintf("%q is not a number written with the declared decimal separator %q (no thousands separators)",
			s, string(decimal))
	}
	v, err := strconv.ParseFloat(strings.Replace(s, string(sep), ".", 1), 64)
	if err != nil {
		return nil, fmt.Sprintf("%q is beyond the range of a 64-bit float", s)
	}
	return v, ""
}

func countDigits(s string) int {
	n := 0
	for n < len(s) && s[n] >= '0' && s[n] <= '9' {
		n++
	}
	return n
}

// csvAnswerHeader is the header of a CSV answer: per sample its status and
// either its top cause with that cause's first remedy and target, or a
// one-line summary of its problem.
var csvAnswerHeader = []string{"sample_id", "status", "top_cause", "score", "top_remedy",
	"target_quantity", "target_op", "target_value", "target_unit", "problem"}

// csvTextColumns are the columns of csvAnswerHeader that hold text: all
// but status, score and target_value.
var csvTextColumns = []int{0, 2, 4, 5, 6, 8, 9}

// inertCell keeps a spreadsheet from running a text cell as a formula: a
// cell that begins with =, +, -, @, tab or carriage return gets a leading
// single quote, as OWASP's "CSV Injection" page recommends. Only text
// cells go through it, so a negative number stays a number.
func inertCell(s string) string {
	if s != "" && strings.IndexByte("=+-@\t\r", s[0]) >= 0 {
		return "'" + s
	}
	return s
}

// csvRow is the answer row of one item, numbers written with the
// dialect's decimal separator and text cells made inert (inertCell).
func csvRow(it batchItem, d csvDialect) []string {
	num := func(v float64) string {
		return strings.Replace(strconv.FormatFloat(v, 'g', -1, 64), ".", string(d.decimal), 1)
	}
	row := make([]string, len(csvAnswerHeader))
	row[0], row[1] = it.SampleID, strconv.Itoa(it.Status)
	if it.Report != nil && len(it.Report.Causes) > 0 {
		top := it.Report.Causes[0]
		row[2], row[3] = top.ID, num(top.Score)
		if len(top.Remedies) > 0 {
			rem := top.Remedies[0]
			row[4] = rem.ID
			if t := rem.Target; t != nil {
				row[5], row[6], row[7], row[8] = t.Quantity, t.Op, num(t.Value), t.Unit
			}
		}
	}
	if it.Problem != nil {
		row[9] = problemSummary(it.Problem)
	}
	for _, j := range csvTextColumns {
		row[j] = inertCell(row[j])
	}
	return row
}

// writeCSV answers with the header and rows in dialect d.
func writeCSV(c echo.Context, rows [][]string, d csvDialect) error {
	var buf bytes.Buffer
	w := csv.NewWriter(&buf)
	w.Comma = d.delimiter
	w.UseCRLF = true
	_ = w.Write(csvAnswerHeader)
	_ = w.WriteAll(rows)
	if err := w.Error(); err != nil {
		return err
	}
	ct := mime.FormatMediaType(mimeCSV, map[string]string{"charset": "utf-8", "header": "present",
		"delimiter": d.delimiterName(), "decimal": string(d.decimal)})
	return c.Blob(http.StatusOK, ct, buf.Bytes())
}

// problemSummary puts a problem on one line: its title, then each field.
func problemSummary(p *Problem) string {
	parts := []string{p.Title}
	if p.Detail != "" && len(p.Errors) == 0 {
		parts = append(parts, p.Detail)
	}
	for _, f := range p.Errors {
		s := f.Pointer + " " + f.Reason
		if f.Valid != "" {
			s += " (valid: " + f.Valid
			if f.Unit != "" {
				s += ", in " + f.Unit
			}
			s += ")"
		}
		parts = append(parts, s)
	}
	return strings.Join(parts, "; ")
}
