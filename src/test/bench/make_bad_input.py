#!/usr/bin/env python3
"""Writes the bad-input corpus under src/test/resources/bad-input/ (one folder per case:
request.properties and, unless the body is generated, a file named body). Run from the project
root; the folders are committed, this script only saves typing them by hand."""
import os
import shutil

ROOT = "src/test/resources/bad-input"
CASES = []


def case(name, path, ctype, body, status, message, method="POST", repeat=None):
    CASES.append((name, method, path, ctype, body, status, message, repeat))


def quarters(n, start=2000, value=lambda i: 10 + i):
    return [f"{start + i // 4}-Q{i % 4 + 1}" for i in range(n)], [value(i) for i in range(n)]


def csv(periods, values, header="period,value"):
    return header + "\n" + "".join(f"{p},{v}\n" for p, v in zip(periods, values))


def obs_json(periods, values):
    return ", ".join(f'{{"period": "{p}", "value": {v}}}' for p, v in zip(periods, values))


def fit_body(periods, values, model, extra=""):
    return ('{"series": {"observations": [' + obs_json(periods, values) + ']}, "model": ' + model + extra + '}')


P8, V8 = quarters(8)
GOOD_CSV = csv(P8, V8)
GOOD_OBS = obs_json(P8, V8)
LINEAR = '{"family": "trend", "shape": "linear"}'
CSV = "text/csv"
JSON = "application/json"

# --- malformed CSV: unbalanced quotes -----------------------------------------------------
quote_bodies = {
    "quote-open-in-value": 'period,value\n2024-Q1,"12.5\n2024-Q2,13\n',
    "quote-open-in-period": 'period,value\n"2024-Q1,12.5\n2024-Q2,13\n',
    "quote-open-in-header": '"period,value\n2024-Q1,12.5\n2024-Q2,13\n',
    "quote-open-last-cell": 'period,value\n2024-Q1,12.5\n2024-Q2,"13\n',
    "quote-open-at-end": 'period,value\n2024-Q1,12.5\n2024-Q2,13\n"',
    "quote-inside-unquoted": 'period,value\n2024-Q1,12"5\n2024-Q2,13\n',
    "quote-after-closing": 'period,value\n"2024-Q1"x,12.5\n2024-Q2,13\n',
    "quote-text-after-close": 'period,value\n2024-Q1,"12.5"abc\n2024-Q2,13\n',
    "quote-semicolon-open": 'period;value\n2024-Q1;"12,5\n2024-Q2;13\n',
    "quote-tab-open": 'period\tvalue\n2024-Q1\t"12.5\n2024-Q2\t13\n',
}
for name, body in quote_bodies.items():
    case("csv-" + name, "/api/series", CSV, body, 422, "")

# --- malformed CSV: ragged rows and shapes ------------------------------------------------
ragged = {
    "ragged-extra-cell": "period,value\n2024-Q1,1\n2024-Q2,2,3\n2024-Q3,4\n",
    "ragged-missing-cell": "period,value\n2024-Q1,1\n2024-Q2\n2024-Q3,4\n",
    "ragged-wide-header": "period,a,b\n2024-Q1,1,2\n2024-Q2,3\n",
    "ragged-trailing-delimiter": "period,value\n2024-Q1,1,\n2024-Q2,2\n",
    "ragged-last-row-short": "period,a,b\n2024-Q1,1,2\n2024-Q2,3,4\n2024-Q3,5\n",
    "ragged-last-row-long": "period,a,b\n2024-Q1,1,2\n2024-Q2,3,4\n2024-Q3,5,6,7\n",
    "ragged-semicolon": "period;value\n2024-Q1;1\n2024-Q2;2;3\n",
    "ragged-tab": "period\tvalue\n2024-Q1\t1\n2024-Q2\t2\t3\n",
    "one-column": "value\n1\n2\n3\n",
    "one-column-periods": "period\n2024-Q1\n2024-Q2\n",
    "empty-body": "",
    "only-newlines": "\n\n\n",
    "only-spaces": "   \n  \n",
    "header-only": "period,value\n",
    "bom-only": "\ufeff",
    "binary-garbage": "\u0001\u0002\u0003,\u0004\n\u0005,\u0006\n",
    "no-period-column": "a,b\n1,2\n3,4\n",
    "period-words": "period,value\nspring,1\nsummer,2\n",
    "period-quarter-5": "period,value\n2024-Q5,1\n2025-Q1,2\n",
    "period-month-13": "period,value\n2024-13,1\n2024-12,2\n",
    "period-month-00": "period,value\n2024-00,1\n2024-01,2\n",
    "period-date-feb-30": "period,value\n2023-02-30,1\n2023-03-31,2\n",
    "period-date-feb-29-nonleap": "period,value\n2023-02-28,1\n2023-03-01,2\n2023-02-29,3\n",
    "period-week-54": "period,value\n2024-W54,1\n2024-W52,2\n",
    "period-week-53-in-52-year": "period,value\n2023-W52,1\n2023-W53,2\n",
    "period-year-too-short": "period,value\n24,1\n25,2\n",
    "period-empty-cell": "period,value\n2024-Q1,1\n,2\n2024-Q3,3\n",
    "value-text": "period,value\n2024-Q1,1\n2024-Q2,twelve\n",
    "value-two-dots": "period,value\n2024-Q1,1.2.3\n2024-Q2,2\n",
    "value-comma-decimal": 'period,value\n2024-Q1,"1,5"\n2024-Q2,2\n',
    "value-currency": "period,value\n2024-Q1,$12\n2024-Q2,13\n",
    "value-percent": "period,value\n2024-Q1,12%\n2024-Q2,13\n",
    "value-hex": "period,value\n2024-Q1,0x1F\n2024-Q2,13\n",
    "duplicate-series-names": "period,a,a\n2024-Q1,1,2\n2024-Q2,3,4\n",
    "empty-series-name": "period,,b\n2024-Q1,1,2\n2024-Q2,3,4\n",
}
for name, body in ragged.items():
    case("csv-" + name, "/api/series", CSV, body, 422, "")

# --- mixed period forms -----------------------------------------------------------------
mixed = {
    "quarter-and-month": ["2024-Q1", "2024-05", "2024-Q3"],
    "quarter-and-year": ["2024-Q1", "2024-Q2", "2025"],
    "month-and-week": ["2024-01", "2024-W06", "2024-03"],
    "week-and-quarter": ["2024-W01", "2024-Q1", "2024-W03"],
    "year-and-month": ["2022", "2023", "2024-01"],
    "quarter-and-daily-dates": ["2024-Q1", "2024-04-15", "2024-Q3"],
    "month-and-quarter-compact": ["2024-01", "2024Q1", "2024-03"],
    "slash-month-and-week": ["01/2024", "02/2024", "2024-W10"],
    "quarter-year-and-month": ["Q1 2024", "Q2 2024", "2024-07"],
    "daily-and-month-ends": ["2024-01-31", "2024-02-01", "2024-03"],
    "year-and-week": ["2023", "2024-W01", "2025"],
}
for name, periods in mixed.items():
    case("mixed-" + name, "/api/series", CSV, csv(periods, [1, 2, 3]), 422, "")
case("mixed-json-quarter-and-month", "/api/series", JSON,
     '{"name": "m", "observations": [' + obs_json(["2024-Q1", "2024-02"], [1, 2]) + ']}', 422, "")

# --- duplicate periods ------------------------------------------------------------------
dups = {
    "same-label": ["2024-Q1", "2024-Q2", "2024-Q2"],
    "two-spellings": ["2024-Q1", "2024Q1", "2024-Q2"],
    "quarter-year-spelling": ["2024-Q1", "Q1 2024", "2024-Q2"],
    "month-spellings": ["2024-01", "01/2024", "2024-02"],
    "first-and-last": ["2024-Q1", "2024-Q2", "2024-Q1"],
    "two-quarter-dates": ["2024-03-31", "2024-01-01", "2024-06-30"],
    "lower-case-q": ["2024-Q3", "2024-q3", "2024-Q4"],
    "year-twice": ["2022", "2023", "2023"],
    "week-twice": ["2024-W05", "2024-W05", "2024-W06"],
}
for name, periods in dups.items():
    case("duplicate-" + name, "/api/series", CSV, csv(periods, [1, 2, 3]), 422, "")
case("duplicate-json", "/api/series", JSON,
     '{"name": "d", "observations": [' + obs_json(["2024-Q1", "2024-Q1"], [1, 2]) + ']}', 422, "")
case("duplicate-long-format", "/api/series", CSV,
     "series,period,value\na,2024-Q1,1\na,2024-Q1,2\nb,2024-Q1,3\n", 422, "")
case("duplicate-fit-posted", "/api/fit", JSON, fit_body(["2024-Q1", "2024-Q2", "2024-Q2", "2024-Q3"],
                                                        [1, 2, 3, 4], LINEAR), 422, "")

# --- gaps when gaps are refused ---------------------------------------------------------
gaps = {
    "missing-quarter": ["2024-Q1", "2024-Q2", "2024-Q4"],
    "missing-month": ["2024-01", "2024-02", "2024-04"],
    "missing-year": ["2020", "2021", "2023"],
    "missing-week": ["2024-W01", "2024-W02", "2024-W04"],
    "missing-several-quarters": ["2020-Q1", "2020-Q2", "2023-Q1"],
}
for name, periods in gaps.items():
    case("gap-" + name, "/api/series", CSV, csv(periods, [1, 2, 3]), 422, "", )
case("gap-empty-value-refused", "/api/series", CSV, "period,value\n2024-Q1,1\n2024-Q2,\n2024-Q3,3\n", 422, "")
case("gap-na-value-refused", "/api/series", CSV, "period,value\n2024-Q1,1\n2024-Q2,NA\n2024-Q3,3\n", 422, "")
case("gap-json-null-refused", "/api/series", JSON,
     '{"name": "g", "observations": [{"period": "2024-Q1", "value": 1}, {"period": "2024-Q2", "value": null}]}',
     422, "")
gp, gv = quarters(12)
case("gap-fit-posted-missing-quarter", "/api/fit", JSON, fit_body(gp[:5] + gp[6:], gv[:5] + gv[6:], LINEAR),
     422, "")
case("gap-fit-autoregression", "/api/fit?missing=gap", JSON,
     fit_body(gp[:5] + gp[6:], gv[:5] + gv[6:], '{"family": "autoregression", "order": 1}'), 422, "")

# --- NaN, Infinity, empty cells ---------------------------------------------------------
for i, token in enumerate(["NaN", "nan", "Infinity", "-Infinity", "inf", "-inf", "+Inf", "1/0", "∞", " - "]):
    case(f"value-special-{i:02d}", "/api/series", CSV,
         f"period,value\n2024-Q1,1\n2024-Q2,{token}\n2024-Q3,3\n", 422, "")
for i, token in enumerate(["NaN", "Infinity", "-Infinity", '"NaN"', '"Infinity"', '""', '"12,5"', "true", "[1]",
                           '{"x": 1}']):
    case(f"json-value-special-{i:02d}", "/api/series", JSON,
         '{"name": "s", "observations": [{"period": "2024-Q1", "value": 1}, {"period": "2024-Q2", "value": '
         + token + '}]}', 422 if i >= 3 else 400, "")
case("json-value-nan-in-fit", "/api/fit", JSON, fit_body(["2024-Q1", "2024-Q2"], [1, "NaN"], LINEAR), 400, "")

# --- non-positive values for a log-linear trend -----------------------------------------
LOG = '{"family": "trend", "scale": "log"}'
for name, bad in {"zero": 0, "negative": -3, "negative-small": -1e-300, "zero-first": None}.items():
    p, v = quarters(12)
    if bad is None:
        v[0] = 0
    else:
        v[6] = bad
    case("log-linear-" + name, "/api/fit", JSON, fit_body(p, v, LOG), 422, "")
p, v = quarters(12)
case("log-linear-all-negative", "/api/fit", JSON, fit_body(p, [-x for x in v], LOG), 422, "")
case("log-quadratic-zero", "/api/fit", JSON,
     fit_body(p, [0] + v[1:], '{"family": "trend", "shape": "quadratic", "scale": "log"}'), 422, "")
case("log-seasonal-negative", "/api/fit", JSON,
     fit_body(p, v[:3] + [-1] + v[4:], '{"family": "trend", "scale": "log", "seasonal": true}'), 422, "")
case("log-linear-negative-zero", "/api/fit", JSON, fit_body(p, v[:4] + ["-0.0"] + v[5:], LOG), 422, "")

# --- too few observations -----------------------------------------------------------------
few = [
    ("linear-one", 1, LINEAR), ("linear-two", 2, LINEAR),
    ("quadratic-three", 3, '{"family": "trend", "shape": "quadratic"}'),
    ("seasonal-four", 4, '{"family": "trend", "seasonal": true}'),
    ("seasonal-five", 5, '{"family": "trend", "seasonal": true}'),
    ("log-two", 2, LOG),
    ("ar1-three", 3, '{"family": "autoregression", "order": 1}'),
    ("ar4-six", 6, '{"family": "autoregression", "order": 4}'),
    ("quadratic-seasonal-six", 6, '{"family": "trend", "shape": "quadratic", "seasonal": true}'),
]
for name, n, model in few:
    p, v = quarters(n)
    case("too-few-" + name, "/api/fit", JSON, fit_body(p, v, model), 422, "")
p, v = quarters(12)
case("too-few-empty-observations", "/api/fit", JSON, '{"series": {"observations": []}, "model": ' + LINEAR + '}',
     422, "")

# --- numbers beyond double range ----------------------------------------------------------
for i, token in enumerate(["1e309", "-1e309", "1.8e308", "9" * 400, "1e99999", "-2e308"]):
    case(f"beyond-double-csv-{i}", "/api/series", CSV, f"period,value\n2024-Q1,1\n2024-Q2,{token}\n", 422, "")
for i, token in enumerate(["1e309", "-1e309", "9" * 400 + ".0", "1e99999"]):
    case(f"beyond-double-json-{i}", "/api/series", JSON,
         '{"name": "b", "observations": [{"period": "2024-Q1", "value": 1}, {"period": "2024-Q2", "value": '
         + token + '}]}', 422, "")
case("beyond-double-fit", "/api/fit", JSON, fit_body(["2024-Q1", "2024-Q2", "2024-Q3"], [1, "1e309", 2], LINEAR),
     422, "")

# --- truncated JSON -----------------------------------------------------------------------
whole = '{"name": "t", "observations": [' + GOOD_OBS + ']}'
for i, cut in enumerate([1, 2, 9, 15, 31, 40, 55, len(whole) // 2, len(whole) - 2, len(whole) - 1]):
    case(f"json-truncated-series-{i:02d}", "/api/series", JSON, whole[:cut], 400, "")
whole_fit = fit_body(P8, V8, LINEAR)
for i, cut in enumerate([1, 12, len(whole_fit) // 2, len(whole_fit) - 20, len(whole_fit) - 1]):
    case(f"json-truncated-fit-{i:02d}", "/api/fit", JSON, whole_fit[:cut], 400, "")
json_bad = {
    "trailing-comma": '{"name": "t", "observations": [' + GOOD_OBS + ',]}',
    "single-quotes": "{'name': 't'}",
    "unquoted-key": '{name: "t"}',
    "comment": '{"name": "t" /* x */, "observations": [' + GOOD_OBS + ']}',
    "two-documents": whole + whole,
    "bare-string": '"hello"',
    "bare-number": "42",
    "null": "null",
    "array-of-numbers": "[1, 2, 3]",
    "empty-object": "{}",
    "observations-not-array": '{"name": "t", "observations": {"period": "2024-Q1"}}',
    "period-number": '{"name": "t", "observations": [{"period": 2024, "value": 1}, {"period": 2025, "value": 2}]}',
    "empty": "",
}
SEMANTIC = {"bare-string", "bare-number", "null", "array-of-numbers", "empty-object", "observations-not-array",
            "period-number", "empty"}
for name, body in json_bad.items():
    case("json-" + name, "/api/series", JSON, body, 422 if name in SEMANTIC else 400, "")
fit_bad = {
    "no-model": '{"series": {"observations": [' + GOOD_OBS + ']}}',
    "no-series": '{"model": ' + LINEAR + '}',
    "unknown-family": fit_body(P8, V8, '{"family": "crystal-ball"}'),
    "no-family": fit_body(P8, V8, '{"shape": "linear"}'),
    "unknown-shape": fit_body(P8, V8, '{"family": "trend", "shape": "cubic"}'),
    "horizon-zero": fit_body(P8, V8, LINEAR, ', "horizon": 0'),
    "horizon-huge": fit_body(P8, V8, LINEAR, ', "horizon": 100000'),
    "horizon-text": fit_body(P8, V8, LINEAR, ', "horizon": "many"'),
    "level-above-one": fit_body(P8, V8, LINEAR, ', "levels": [1.5]'),
    "level-zero": fit_body(P8, V8, LINEAR, ', "levels": [0]'),
    "significance-one": fit_body(P8, V8, LINEAR, ', "significanceLevel": 1'),
    "significance-negative": fit_body(P8, V8, LINEAR, ', "significanceLevel": -0.05'),
    "ar-order-negative": fit_body(P8, V8, '{"family": "autoregression", "order": -1}'),
    "model-array": fit_body(P8, V8, '[]'),
    "series-array": '{"series": [], "model": ' + LINEAR + '}',
}
for name, body in fit_bad.items():
    semantic = name.startswith(("level-", "significance-")) or name == "series-array"
    case("fit-" + name, "/api/fit", JSON, body, 422 if semantic else 400, "")

# --- deeply nested JSON (generated) -----------------------------------------------------
case("json-nested-arrays-100k", "/api/series", JSON, None, 400, "",
     repeat={"prefix": "", "unit": "[", "count": 100000, "suffix": ""})
case("json-nested-objects-50k", "/api/series", JSON, None, 400, "",
     repeat={"prefix": "", "unit": '{"a":', "count": 50000, "suffix": "1"})
case("json-nested-in-model", "/api/fit", JSON, None, 400, "",
     repeat={"prefix": '{"series": {"observations": []}, "model": ', "unit": '{"x":', "count": 5000, "suffix": "1"})
case("json-nested-in-value", "/api/series", JSON, None, 400, "",
     repeat={"prefix": '{"name": "n", "observations": [{"period": "2024-Q1", "value": ', "unit": "[", "count": 3000,
             "suffix": ""})
case("json-nested-closed-2k", "/api/series", JSON, None, 400, "",
     repeat={"prefix": '{"name": "n", "observations": ' + "[" * 2000, "unit": "]", "count": 2000, "suffix": "}"})

# --- bodies over the limit (10 MiB by default; generated) ----------------------------------
case("over-limit-csv", "/api/series", CSV, None, 413, "", repeat={
    "prefix": "period,value\n", "unit": "2024-Q1,1.000000000000000000000000\n", "count": 400000, "suffix": ""})
case("over-limit-json", "/api/series", JSON, None, 413, "", repeat={
    "prefix": '{"name": "big", "observations": [', "unit": '{"period": "2024-Q1", "value": 1.0000000000}, ',
    "count": 250000, "suffix": "]}"})
case("over-limit-fit", "/api/fit", JSON, None, 413, "", repeat={
    "prefix": '{"model": {"family": "trend"}, "series": {"observations": [',
    "unit": '{"period": "2024-Q1", "value": 1.0000000000}, ', "count": 250000, "suffix": "]}}"})
case("over-limit-whitespace", "/api/fit", JSON, None, 413, "", repeat={
    "prefix": "{", "unit": "          ", "count": 1100000, "suffix": "}"})
case("too-many-observations", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "period,value\n", "unit": "{i},1\n", "count": 100001, "suffix": "", "index": "day"})
case("csv-tiny-rows-past-the-limit", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "period,value\n", "unit": "2024-Q1,1\n", "count": 1000000, "suffix": ""})
case("csv-tiny-rows-no-header", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "", "unit": "2024-Q1,1\n", "count": 1000000, "suffix": ""})
case("too-many-series", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "period", "unit": ",s{i}", "count": 1001, "suffix": "\n2024-Q1" + ",1" * 1001 + "\n"})

# --- a million columns (generated) --------------------------------------------------------
case("csv-million-columns", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "period", "unit": ",c{i}", "count": 1000000, "suffix": "\n"})
case("csv-million-cells-one-row", "/api/series", CSV, None, 422, "", repeat={
    "prefix": "period,value\n2024-Q1", "unit": ",1", "count": 1000000, "suffix": "\n"})

# --- wrong content types ------------------------------------------------------------------
for i, ctype in enumerate(["application/xml", "text/html", "application/x-www-form-urlencoded",
                           "application/octet-stream", "image/png", "text/javascript"]):
    case(f"content-type-series-{i}", "/api/series", ctype, GOOD_CSV, 415, "")
for i, ctype in enumerate(["text/csv", "text/plain", "application/xml", "multipart/form-data; boundary=x"]):
    case(f"content-type-fit-{i}", "/api/fit", ctype, fit_body(P8, V8, LINEAR), 415, "")
case("content-type-none-series", "/api/series", "", GOOD_CSV, 415, "")
case("content-type-none-fit", "/api/fit", "", fit_body(P8, V8, LINEAR), 415, "")
case("multipart-no-file-part", "/api/series", "multipart/form-data; boundary=XyZ",
     "--XyZ\r\nContent-Disposition: form-data; name=\"other\"\r\n\r\n" + GOOD_CSV + "\r\n--XyZ--\r\n", 400, "")
case("multipart-truncated", "/api/series", "multipart/form-data; boundary=XyZ",
     "--XyZ\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\n\r\n" + GOOD_CSV, 400, "")
case("multipart-no-boundary", "/api/series", "multipart/form-data", GOOD_CSV, 400, "")
case("multipart-ragged-file", "/api/series", "multipart/form-data; boundary=XyZ",
     "--XyZ\r\nContent-Disposition: form-data; name=\"file\"; filename=\"a.csv\"\r\nContent-Type: text/csv\r\n\r\n"
     "period,value\n2024-Q1,1,2\n2024-Q2,2\n\r\n--XyZ--\r\n", 422, "")

# --- invalid UTF-8 ------------------------------------------------------------------------
utf8 = {
    "lone-continuation": b"\x80",
    "ff-byte": b"\xff",
    "overlong-slash": b"\xc0\xaf",
    "truncated-two-byte": b"\xc3",
    "truncated-three-byte": b"\xe2\x82",
    "encoded-surrogate": b"\xed\xa0\x80",
    "beyond-unicode": b"\xf4\x90\x80\x80",
    "latin1-e-acute": b"caf\xe9",
}
for name, bad in utf8.items():
    CASES.append(("utf8-csv-" + name, "POST", "/api/series", CSV,
                  b"period,value\n2024-Q1,1\n2024-Q2," + bad + b"\n", 422, "", None))
for name in ["ff-byte", "encoded-surrogate", "latin1-e-acute", "lone-continuation"]:
    CASES.append(("utf8-json-" + name, "POST", "/api/series", JSON,
                  b'{"name": "' + utf8[name] + b'", "observations": [' + GOOD_OBS.encode() + b"]}", 400, "", None))
CASES.append(("utf8-fit-ff-byte", "POST", "/api/fit", JSON,
              b'{"series": {"name": "\xff"}, "model": ' + LINEAR.encode() + b"}", 400, "", None))

# --- query parameters and paths -----------------------------------------------------------
case("query-missing-unknown", "/api/series?missing=maybe", CSV, GOOD_CSV, 400, "")
case("query-delimiter-unknown", "/api/series?delimiter=pipe", CSV, GOOD_CSV, 400, "")
case("query-delimiter-wrong", "/api/series?delimiter=semicolon", CSV, GOOD_CSV, 422, "")
case("path-id-text", "/api/series/abc/versions", CSV, GOOD_CSV, 400, "")
case("path-id-zero", "/api/series/0/versions", CSV, GOOD_CSV, 400, "")
case("path-id-negative", "/api/series/-4", None, None, 400, "", method="GET")
case("path-id-overflow", "/api/series/99999999999999999999", None, None, 400, "", method="GET")
case("path-version-text", "/api/series/1/versions/one", None, None, 400, "", method="GET")
case("path-unknown-series", "/api/series/424242", None, None, 404, "", method="GET")
case("path-unknown-route", "/api/seriez", CSV, GOOD_CSV, 404, "")
case("path-fit-unknown-series", "/api/series/424242/versions/1/fit", JSON, '{"model": ' + LINEAR + '}', 404, "")
case("method-put-series", "/api/series", CSV, GOOD_CSV, 405, "", method="PUT")
case("delete-without-if-match", "/api/series/424242", None, None, 404, "", method="DELETE")


# The fragment of the problem detail each case expects, by the first matching name prefix.
FRAGMENTS = [
    ("csv-quote-inside-unquoted", "'12\"5' is not a number"),
    ("csv-quote-", "check for an unbalanced double quote"),
    ("csv-ragged-", "every row needs the same number of cells"),
    ("csv-million-cells", "the row has 1000001 cells"),
    ("csv-million-columns", "only a header row"),
    ("csv-tiny-rows-", "the file holds more than 200002 rows"),
    ("csv-header-only", "only a header row"),
    ("csv-one-column", "a series needs a period column and a value column"),
    ("csv-only-spaces", "a series needs a period column and a value column"),
    ("csv-empty-body", "the file holds no rows"), ("csv-only-newlines", "the file holds no rows"),
    ("csv-bom-only", "the file holds no rows"),
    ("csv-binary-garbage", "the period is empty"), ("csv-period-empty-cell", "the period is empty"),
    ("csv-no-period-column", "'1' is not a period"),
    ("csv-period-", "is not a period; write periods as"),
    ("csv-value-", "is not a number; write numbers with a decimal point"),
    ("csv-duplicate-series-names", "two columns are named 'a'"),
    ("csv-empty-series-name", "gives column 2 no name"),
    ("mixed-", "a series has one frequency"),
    ("duplicate-two-quarter-dates", "cannot tell the frequency of the date column"),
    ("duplicate-", "appears twice"),
    ("gap-empty-value-refused", "the value for 2024-Q2 is empty"),
    ("gap-na-value-refused", "'NA' is not a number"),
    ("gap-json-null-refused", "send missing=gap"),
    ("gap-fit-autoregression", "An autoregression needs consecutive observations"),
    ("gap-", "is missing between"),
    ("value-special-07", "is not a number"), ("value-special-08", "is not a number"),
    ("value-special-09", "is not a number"),
    ("value-special-", "NaN and Infinity are not accepted"),
    ("json-value-special-00", "Non-standard token 'NaN'"),
    ("json-value-special-01", "Non-standard token 'Infinity'"),
    ("json-value-special-02", "Non-standard token '-Infinity'"),
    ("json-value-special-", "must be a number or null"),
    ("json-value-nan-in-fit", "Non-standard token 'NaN'"),
    ("log-", "A log-scale trend needs values above zero"),
    ("too-few-empty-observations", "must be a non-empty array"),
    ("too-few-", "usable observations but the series has"),
    ("beyond-double-", "is not a finite number; values must lie within about +-1.8e308"),
    ("json-truncated-", "Unexpected end-of-input"),
    ("json-nested-", "nesting depth (1001) exceeds the maximum allowed (1000"),
    ("json-trailing-comma", "expected a value"),
    ("json-single-quotes", "was expecting double-quote to start field name"),
    ("json-unquoted-key", "was expecting double-quote to start field name"),
    ("json-comment", "comment"),
    ("json-two-documents", "Trailing token"),
    ("json-empty-object", "name: is required"),
    ("json-observations-not-array", "must be a non-empty array"),
    ("json-period-number", "must be a string, got 2024"),
    ("json-", "the request body must be a JSON object"),
    ("fit-no-model", "model is required"), ("fit-no-series", "series is required"),
    ("fit-unknown-family", "Could not resolve type id 'crystal-ball'"),
    ("fit-no-family", "missing type id property 'family'"),
    ("fit-unknown-shape", "model.shape must be 'linear' or 'quadratic'"),
    ("fit-horizon-text", "(field horizon)"), ("fit-horizon-", "horizon must lie in 1..1000"),
    ("fit-level-", "must lie strictly between 0 and 1"), ("fit-significance-", "must lie strictly between 0 and 1"),
    ("fit-ar-order-negative", "model.order must be 0 or more"),
    ("fit-model-array", "(field model)"), ("fit-series-array", "series must be a JSON object"),
    ("over-limit-", "larger than the configured limit"),
    ("too-many-observations", "would hold 100001 observations; the limit is 100000"),
    ("too-many-series", "the file holds 1001 series; the limit per upload is 1000"),
    ("content-type-", "is not accepted here"),
    ("multipart-no-file-part", "a part named 'file'"),
    ("multipart-ragged-file", "every row needs the same number of cells"),
    ("multipart-", "The multipart body could not be read"),
    ("utf8-csv-", "the file is not valid UTF-8"), ("utf8-", "Invalid UTF-8"),
    ("query-missing-unknown", "missing must be 'refuse' or 'gap'"),
    ("query-delimiter-unknown", "delimiter must be comma, semicolon or tab"),
    ("query-delimiter-wrong", "found one column with delimiter 'semicolon'"),
    ("path-id-", "The path parameter id must be a positive whole number"),
    ("path-version-text", "The path parameter version must be a positive whole number"),
    ("path-unknown-route", "There is no resource at /api/seriez"),
    ("path-", "There is no series 424242"), ("delete-", "There is no series 424242"),
    ("method-put-series", "PUT is not allowed on /api/series"),
]


def escape(text):
    """A value as java.util.Properties reads it (UTF-8 reader): backslashes and newlines escaped."""
    text = text.replace("\\", "\\\\").replace("\n", "\\n")
    return "\\" + text if text.startswith(" ") else text


def fragment(name):
    return next(text for prefix, text in FRAGMENTS if name.startswith(prefix))


def write():
    if os.path.isdir(ROOT):
        for entry in os.listdir(ROOT):
            if os.path.isdir(os.path.join(ROOT, entry)):
                shutil.rmtree(os.path.join(ROOT, entry))
    os.makedirs(ROOT, exist_ok=True)
    names = set()
    for name, method, path, ctype, body, status, message, repeat in CASES:
        assert name not in names, name
        names.add(name)
        folder = os.path.join(ROOT, name)
        os.makedirs(folder)
        props = [f"method={method}", f"path={path}", f"status={status}", "message=" + escape(message or fragment(name))]
        if ctype is not None:
            props.append(f"contentType={ctype}")
        if repeat:
            for key, value in repeat.items():
                props.append(f"repeat.{key}=" + escape(str(value)))
        with open(os.path.join(folder, "request.properties"), "w", encoding="utf-8") as f:
            f.write("\n".join(props) + "\n")
        if body is not None:
            with open(os.path.join(folder, "body"), "wb") as f:
                f.write(body if isinstance(body, bytes) else body.encode("utf-8"))
    print(len(CASES), "cases")


if __name__ == "__main__":
    write()
