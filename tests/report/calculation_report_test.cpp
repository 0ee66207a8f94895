// Verification of the calculation report (src/calculation_report.cpp) and of
// the SHA-256 that identifies its input file (src/sha256.cpp).
//
// References:
//   [FIPS]  FIPS 180-4, Secure Hash Standard (NIST, 2015), and the NIST
//           example values for SHA-256 ("abc", the 448-bit two-block message)
//           and the well-known digest of the empty string. Exact comparison.
//   [ROARK] Roark's Formulas for Stress and Strain, 7th ed., Table 8.1
//           (reference pack: simply supported and propped cantilever with a
//           uniform load, [M] from memory, cross-checked by Hicks, Civil
//           Engineering Formulas, Fig. 2.2 [C]): propped cantilever fixed-end
//           moment w L^2 / 8; simply supported end rotation w L^3 / (24 E I).
//   [BL]    The beam-line construction (common practice, no source): the
//           intersection of the beam line with the joint line M = S theta is
//           the analysed state, here the corner states of assess_beam, 1e-9
//           relative.
//   [EX]    catalog-examples/mezzanine-fin-plates.json (invented example).
//   [SELF]  The report's own promises (docs/report.md): self-contained, the
//           verdict, the caution, one SVG per chart, user text escaped.
#include <doctest/doctest.h>

#include <nlohmann/json.hpp>

#include <cmath>
#include <fstream>
#include <sstream>
#include <string>

#include "pinproof/checks/assessment.hpp"
#include "pinproof/report/calculation_report.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/report/text_report.hpp"
#include "pinproof/io/project_input.hpp"
#include "pinproof/joints/joint_from_detail.hpp"

using namespace pinproof;

namespace {

std::string read_text(const std::string& path)
{
    std::ifstream in(path, std::ios::binary);
    std::ostringstream s;
    s << in.rdbuf();
    return s.str();
}

const std::string example = std::string(PINPROOF_SOURCE_DIR) + "/catalog-examples/mezzanine-fin-plates.json";

std::size_t count(const std::string& text, const std::string& what)
{
    std::size_t n = 0;
    for (std::size_t at = text.find(what); at != std::string::npos; at = text.find(what, at + 1)) ++n;
    return n;
}

report_info test_info(const std::string& bytes)
{
    return {"mezzanine-fin-plates.json", input_hash(bytes), "2026-01-15", "test"};
}

// Charts expected per beam: moment and deflection per combination, the
// sweep, a beam line per end, and a gap drawing per joint with a detail.
std::size_t expected_details(const project& p)
{
    std::size_t n = 0;
    for (const auto& b : p.beams) n += (b.start.detail ? 1 : 0) + (b.end.detail ? 1 : 0);
    return n;
}

std::size_t expected_charts(const project& p)
{
    std::size_t n = expected_details(p);
    // Per beam its elevation; per combination: moment and shear (strength), or
    // deflection; then the sweep and a beam line per end.
    for (const auto& b : p.beams)
        for (const auto& c : b.combinations) n += c.use == limit_state::strength ? 2 : 1;
    for (const auto& b : p.beams) n += 1 + 1 + 2;
    return n;
}

bool close_rel(double a, double b, double rel)
{
    return std::abs(a - b) <= rel * std::max({std::abs(a), std::abs(b), 1e-30});
}

}  // namespace

TEST_CASE("SHA-256 of the FIPS 180-4 example messages [FIPS] exact")
{
    CHECK(input_hash("abc") == "ba7816bf8f01cfea414140de5dae2223b00361a396177a9cb410ff61f20015ad");
    CHECK(input_hash("") == "e3b0c44298fc1c149afbf4c8996fb92427ae41e4649b934ca495991b7852b855");
    CHECK(input_hash("abcdbcdecdefdefgefghfghighijhijkijkljklmklmnlmnomnopnopq") ==
          "248d6a61d20638b8e5c026930c3e6039a33ce45964ff2167f6ecedd419db06c1");
}

TEST_CASE("the report is self-contained and carries verdict and caution and every chart [SELF] [EX]")
{
    const std::string bytes = read_text(example);
    REQUIRE(!bytes.empty());
    project p = parse_project(bytes);
    derive_joints(p);  // the example derives its joints ("from-detail")
    const project_assessment a = assess_project(p);
    const std::string html = calculation_report_html(p, a, test_info(bytes));

    CHECK(html.rfind("<!DOCTYPE html>", 0) == 0);
    CHECK(count(html, "http://") == 0);
    CHECK(count(html, "https://") == 0);
    CHECK(count(html, "<script") == 0);
    CHECK(count(html, "@import") == 0);
    CHECK(count(html, "<link") == 0);
    CHECK(count(html, "src=") == 0);
    // url( only for references inside the page (clip paths), never a fetch.
    CHECK(count(html, "url(") == count(html, "url(#"));

    CHECK(count(html, "Verdict: the simple-support (pinned) assumption") == 1);
    for (const auto& b : a.beams) CHECK(count(html, "Verdict for beam " + html_escape(b.id) + ":") == 1);
    CHECK(count(html, caution_text) >= 1);
    CHECK(count(html, "local codes and licensed practice govern") >= 1);
    CHECK(count(html, input_hash(bytes)) >= 1);
    CHECK(count(html, "2026-01-15") >= 1);

    CHECK(count(html, "<svg") == expected_charts(p));
    // Strength combinations draw moment and shear, the others deflection: the
    // first beam has strength, service and vibration, the second strength and service.
    CHECK(count(html, "data-chart=\"moment\"") == 2);
    CHECK(count(html, "data-chart=\"shear\"") == 2);
    CHECK(count(html, "data-chart=\"deflection\"") == 3);
    CHECK(count(html, "data-chart=\"sweep\"") == 2);
    CHECK(count(html, "data-chart=\"elevation\"") == 2);
    CHECK(count(html, "data-chart=\"beam-line\"") == 4);
    CHECK(count(html, "data-chart=\"gap-detail\"") == expected_details(p));
    CHECK(expected_details(p) > 0);  // the example details its joints
    // Page breaks before each beam, and charts scaled to the printable width.
    CHECK(count(html, "<section class=\"beam\"") == p.beams.size());
    CHECK(count(html, "@page { size: A4") == 1);
    CHECK(count(html, "<svg width=\"100%\"") + count(html, " width=\"100%\"") >= expected_charts(p));
    // Every check's status is written as a word (FAIL is not colour alone).
    std::size_t checks = 0;
    for (const auto& b : a.beams) checks += b.checks.size();
    CHECK(count(html, "<td class=\"status ") == checks + a.beams.size());  // and the summary table
}

TEST_CASE("a failed check is written FAIL with the fail class and the verdict does not hold [SELF]")
{
    auto doc = nlohmann::json::parse(read_text(example));
    // A stiff joint fails the EN 1993-1-8 nominally pinned boundary.
    doc["beams"][0]["joints"]["start"]["stiffness"]["max"] = "50000 kN*m/rad";
    project p = read_project(doc);
    derive_joints(p);  // the example derives its joints ("from-detail")
    const project_assessment a = assess_project(p);
    REQUIRE(!a.beams[0].holds());
    const std::string html = calculation_report_html(p, a, test_info(doc.dump()));
    CHECK(count(html, "<td class=\"status fail\" rowspan=\"2\">FAIL</td>") >= 1);
    CHECK(count(html, "DOES NOT HOLD") >= 2);
}

TEST_CASE("user strings are escaped for HTML [SELF]")
{
    auto doc = nlohmann::json::parse(read_text(example));
    doc["title"] = "Bay <b>1</b> & \"2\"";
    doc["beams"][0]["id"] = "B<1>";
    doc["beams"][0]["description"] = "<script>x</script> & co";
    project p = read_project(doc);
    derive_joints(p);  // the example derives its joints ("from-detail")
    const project_assessment a = assess_project(p);
    report_info info = test_info(doc.dump());
    info.input_file = "in<put>.json";
    const std::string html = calculation_report_html(p, a, info);
    CHECK(count(html, "<b>1</b>") == 0);
    CHECK(count(html, "Bay &lt;b&gt;1&lt;/b&gt; &amp; &quot;2&quot;") >= 1);
    CHECK(count(html, "B<1>") == 0);
    CHECK(count(html, "B&lt;1&gt;") >= 1);
    CHECK(count(html, "<script") == 0);
    CHECK(count(html, "&lt;script&gt;x&lt;/script&gt; &amp; co") == 1);
    CHECK(count(html, "in&lt;put&gt;.json") >= 1);
}

TEST_CASE("beam-line intersections equal the analysed corner states [BL] [EX] 1e-9 relative")
{
    project p = load_project_file(example);
    derive_joints(p);  // the example derives its joints ("from-detail")
    const project_assessment a = assess_project(p);
    for (const auto& ba : a.beams) {
        const beam& b = *ba.input;
        for (const auto& r : ba.combinations) {
            CAPTURE(b.id);
            CAPTURE(r.comb.name);
            const beam_line s = beam_line_of(b, r.comb, beam_end::start);
            const beam_line e = beam_line_of(b, r.comb, beam_end::end);
            // Corners: (min,min), (min,max), (max,min), (max,max) for (start, end).
            CHECK(close_rel(s.lower.moment, r.corners[0].moment_start, 1e-9));
            CHECK(close_rel(s.lower.rotation, r.corners[0].rotation_start, 1e-9));
            CHECK(close_rel(s.upper.moment, r.corners[2].moment_start, 1e-9));
            CHECK(close_rel(s.upper.rotation, r.corners[2].rotation_start, 1e-9));
            CHECK(close_rel(e.lower.moment, r.corners[0].moment_end, 1e-9));
            CHECK(close_rel(e.lower.rotation, r.corners[0].rotation_end, 1e-9));
            CHECK(close_rel(e.upper.moment, r.corners[1].moment_end, 1e-9));
            CHECK(close_rel(e.upper.rotation, r.corners[1].rotation_end, 1e-9));
            // The point lies on the joint line M = S theta.
            CHECK(close_rel(s.upper.moment, b.start.range.max.value() * s.upper.rotation, 1e-12));
        }
    }
}

TEST_CASE("beam line of a uniformly loaded beam with the far end pinned [ROARK] 1e-9 relative")
{
    beam b;
    b.id = "R";
    b.span = 6.0;
    b.E = 210e9;
    b.sec.I = 8.356e-5;
    b.sec.depth = 0.3;
    const double w = 20e3;
    load l;
    l.kind = load_kind::udl;
    l.value = w;
    l.from = 0;
    l.to = b.span;
    l.load_case = "G";
    b.loads = {l};
    combination c;
    c.name = "G";
    c.factors = {{"G", 1.0}};
    b.start.range = {stiffness::spring(1e6), stiffness::spring(5e6)};
    b.end.range = {stiffness::pinned(), stiffness::spring(5e6)};
    const beam_line bl = beam_line_of(b, c, beam_end::start);
    const double L = b.span, EI = b.E * b.sec.I;
    CHECK(bl.far_end.is_pinned());
    CHECK(close_rel(bl.fixed_moment, w * L * L / 8, 1e-9));               // propped cantilever
    CHECK(close_rel(bl.pinned_rotation, w * L * L * L / (24 * EI), 1e-9));  // simply supported
    // Closed form of the intersection with M = S theta.
    const double S = 5e6, th = bl.fixed_moment * bl.pinned_rotation / (S * bl.pinned_rotation + bl.fixed_moment);
    CHECK(close_rel(bl.upper.rotation, th, 1e-12));
}

TEST_CASE("html escape [XML 1.0 2.2]: C0 controls other than tab and line breaks become U+FFFD - exact")
{
    // W3C, Extensible Markup Language 1.0 (5th ed.), 2.2 Characters: Char
    // excludes U+0000..U+0008, U+000B, U+000C, U+000E..U+001F.
    CHECK(pinproof::html_escape("B1\x1b[8m<x>") == "B1\xEF\xBF\xBD[8m&lt;x&gt;");
    CHECK(pinproof::html_escape(std::string("a\0b\tc\n", 6)) == "a\xEF\xBF\xBD" "b\tc\n");
}

TEST_CASE("text report [ECMA48 5.4]: an escape sequence in an id or title cannot reach the terminal - exact")
{
    // The readers refuse control characters; a project built in code is not
    // read, so the report escapes what it prints (core/printable_text.hpp).
    project p = load_project_file(example);
    derive_joints(p);  // the example derives its joints ("from-detail")
    p.title = "Mezzanine\x1b]0;owned\x07";
    p.beams.front().id = "B1\x1b[8m";
    const std::string text = text_report(assess_project(p), "test");
    CHECK(text.find('\x1b') == std::string::npos);
    CHECK(text.find('\x07') == std::string::npos);
    CHECK(text.find("B1<U+001B>[8m") != std::string::npos);
    CHECK(text.find("Mezzanine<U+001B>]0;owned<U+0007>") != std::string::npos);
}

TEST_CASE("calc sheet [CSS Paged Media 3 5.3]: the job in the running header and footer - sheet x of y - user text escaped")
{
    project p = parse_project(R"({"format": "pinproof-project/1", "title": "Calc \"T\" </style>", "standard": "EN1993-1-8",
      "frame": "braced", "job": {"number": "J-1", "made_by": "A\\B", "checked_by": "C", "revision": "P1", "date": "2026-12-01"},
      "beams": [{"id": "B", "span": "6 m", "section": "IPE 300",
        "loads": [{"case": "G", "kind": "udl", "w": "10 kN/m"}],
        "combinations": [{"name": "ULS", "use": "strength", "factors": {"G": 1.35}}],
        "joints": {"start": {"stiffness": 0}, "end": {"stiffness": 0}}}]})");
    const auto a = assess_project(p);
    const std::string html = calculation_report_html(p, a, report_info{});
    CHECK(html.find("@top-left { content: \"Job J-1\";") != std::string::npos);
    CHECK(html.find("Sheet \" counter(page) \" of \" counter(pages)") != std::string::npos);
    CHECK(html.find("Made by A\\5c B  |  Checked by C  |  Rev P1  |  2026-12-01") != std::string::npos);
    // The title cannot end the CSS string or the style element.
    CHECK(html.find("content: \"Calc \\22 T\\22  \\3c /style\\3e \"") != std::string::npos);
    CHECK(html.find("<tr><th>Job number</th><td>J-1</td></tr>") != std::string::npos);
    CHECK(html.find("size: A4") != std::string::npos);
}
