// Verification of reading a schedule part by part (schedule_stream.hpp)
// against reading it whole (parse_schedule, itself verified in
// schedule_test.cpp): the same records, lines, duplicate-id findings and
// refusals, exactly (==), for files larger than the first part.
// Reference: parse_schedule (the project's own whole-file reader; common
// practice, no source: a streamed reader must agree with the whole-file one).
#include <doctest/doctest.h>

#include <string>

#include "pinproof/io/schedule.hpp"
#include "pinproof/io/schedule_stream.hpp"
#include "temp_dir.hpp"

using namespace pinproof;

namespace {

// A schedule of `n` rows, with the awkward cases spread through it: quoted
// cells holding commas, quotes and line breaks, CRLF line ends, comment and
// blank lines, and ids used twice far apart.
std::string awkward_schedule(int n)
{
    std::string t = "\xEF\xBB\xBFid,description,span,section,g,q,start,end\n";
    for (int i = 0; i < n; ++i) {
        const std::string id = i % 997 == 500 ? "B" + std::to_string(i - 500) : "B" + std::to_string(i);
        std::string description = "Beam " + std::to_string(i);
        if (i % 7 == 0) description = "\"Beam " + std::to_string(i) + ", grid \"\"C\"\"\nsecond line\"";
        t += id + "," + description + ",6.0 m,IPE 300,8 kN/m,5 kN/m,FP,FP" + (i % 5 == 0 ? "\r\n" : "\n");
        if (i % 1000 == 999) t += "# a comment line, \"with a quote\"\n\n";
    }
    return t;
}

void check_same_as_whole(const std::string& text, std::size_t part_rows)
{
    pinproof::testing::temp_dir dir("schedule-stream");
    const std::string path = dir.write("s.csv", text);
    const schedule whole = parse_schedule(text, path);
    REQUIRE(text.size() > schedule_stream::first_part_bytes);
    schedule_stream in(path);
    schedule part;
    std::size_t k = 0, parts = 0;
    while (in.next(part, part_rows)) {
        ++parts;
        CHECK(part.columns == whole.columns);
        CHECK(part.header_line == whole.header_line);
        CHECK(part.source == whole.source);
        REQUIRE(part.rows.size() <= part_rows);
        for (std::size_t i = 0; i < part.rows.size(); ++i, ++k) {
            REQUIRE(k < whole.rows.size());
            CHECK(part.rows[i].line == whole.rows[k].line);
            CHECK(part.rows[i].cells == whole.rows[k].cells);
            CHECK(part.earlier_line_with_same_id[i] == whole.earlier_line_with_same_id[k]);
        }
    }
    CHECK(k == whole.rows.size());
    CHECK(parts == (whole.rows.size() + part_rows - 1) / part_rows);
    CHECK(in.rows_read() == whole.rows.size());
    CHECK(in.fraction_read() == 1.0);
}

}  // namespace

TEST_CASE("schedule stream: every record and line and duplicate id as the whole-file reader [parse_schedule] - exact")
{
    const std::string text = awkward_schedule(30000);  // about 2 MB: several reads after the first part
    check_same_as_whole(text, 4096);
    check_same_as_whole(text, 1);
    check_same_as_whole(text, 100000);
}

TEST_CASE("schedule stream: a first part that ends exactly at a line end keeps the line count [parse_schedule] - exact")
{
    // The first read of first_part_bytes ends on a line feed: the rows after it keep their lines.
    std::string text = "id,span,section,g,q,start,end\n";
    const std::string row_tail = ",6.0 m,IPE 300,8 kN/m,5 kN/m,FP,FP\n";
    int i = 0;
    while (text.size() + 40 < schedule_stream::first_part_bytes) text += "B" + std::to_string(i++) + row_tail;
    text += "# " + std::string(schedule_stream::first_part_bytes - text.size() - 3, 'x') + "\n";
    REQUIRE(text.size() == schedule_stream::first_part_bytes);
    for (int k = 0; k < 5000; ++k) text += "B" + std::to_string(i++) + row_tail;
    check_same_as_whole(text, 4096);
}

TEST_CASE("schedule stream: a small file is read whole as parse_schedule reads it [parse_schedule] - exact")
{
    pinproof::testing::temp_dir dir("schedule-stream");
    const std::string path = dir.write("s.csv", "id,span,section,g,q,start,end\nB1,6 m,IPE 300,8 kN/m,5 kN/m,FP,FP\n"
                                                "B1,6 m,IPE 300,8 kN/m,5 kN/m,FP,FP\n");
    schedule_stream in(path);
    schedule part;
    REQUIRE(in.next(part, 10));
    REQUIRE(part.rows.size() == 2);
    CHECK(part.earlier_line_with_same_id == std::vector<std::size_t>{0, 2});
    CHECK_FALSE(in.next(part, 10));
    CHECK(part.rows.empty());
}

TEST_CASE("schedule stream: refusals of the whole file as parse_schedule's [parse_schedule] - exact")
{
    pinproof::testing::temp_dir dir("schedule-stream");
    const auto where_whole = [](const std::string& text) {
        try {
            parse_schedule(text);
        } catch (const input_error& e) {
            return e.problems().at(0).where + ": " + e.problems().at(0).message;
        }
        return std::string("accepted");
    };
    const auto where_streamed = [&](const std::string& text) {
        const std::string path = dir.write("s.csv", text);
        try {
            schedule_stream in(path);
            schedule part;
            while (in.next(part, 1000)) {
            }
        } catch (const input_error& e) {
            return e.problems().at(0).where + ": " + e.problems().at(0).message;
        }
        return std::string("accepted");
    };
    const std::string big = awkward_schedule(20000);
    SUBCASE("a NUL byte after the first part")
    {
        std::string text = big;
        text.insert(text.size() - 30, 1, '\0');
        CHECK(where_streamed(text) == where_whole(text));
        CHECK(where_whole(text).find("NUL byte") != std::string::npos);
    }
    SUBCASE("a quoted cell never closed at the end of the file")
    {
        const std::string text = big + "B99999,\"open cell,6.0 m,IPE 300,8 kN/m,5 kN/m,FP,FP\n";
        CHECK(where_streamed(text) == where_whole(text));
        CHECK(where_whole(text).find("closing double quote") != std::string::npos);
    }
    SUBCASE("a header problem")
    {
        const std::string text = "id,span,section,g,q,start\n" + big.substr(big.find('\n') + 1);
        CHECK(where_streamed(text) == where_whole(text));
    }
}
