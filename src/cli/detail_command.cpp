#include "detail_command.hpp"

#include "beam_choice.hpp"

#include <ostream>

#include "pinproof/joints/joint_from_detail.hpp"
#include "pinproof/checks/assessment.hpp"
#include "pinproof/report/calculation_report.hpp"
#include "pinproof/core/errors.hpp"
#include "pinproof/core/output_file.hpp"
#include "pinproof/model/project.hpp"
#include "pinproof/io/project_input.hpp"

namespace pinproof::cli {

int detail_command(const detail_options& o, std::ostream& out, std::ostream& err)
{
    (void)err;
    output_set outputs;
    outputs.add_input(o.file);
    outputs.add_input(o.details);
    if (o.svg != "-") outputs.add("--svg", o.svg, "");
    outputs.check();  // before any work

    project p = load_project_file(o.file, o.details);
    derive_joints(p);  // "from-detail" joints resolved before any analysis
    const beam* b = &beam_by_id(p, o.beam, o.file);
    const beam_end e = o.end == "start" ? beam_end::start : beam_end::end;
    if (!b->at(e).detail)
        throw input_error(b->pointer + "/joints/" + o.end + "/detail",
                          "expected a connection detail for the " + o.end + " joint of beam " + b->id +
                              ", found none (the drawing needs one)");
    const beam_assessment a = assess_beam(p, *b);
    const auto svg = gap_detail_svg(*b, e, a, p.units);
    if (!svg) throw internal_error("no drawing for a joint with a detail");
    // The summary line: the gap-closure check of this end.
    std::string summary;
    for (const auto& c : a.checks)
        if (c.id == "gap-closure-" + o.end) summary = to_string(c.status) + ": " + c.message;
    if (o.svg == "-") {
        out << *svg;
    } else {
        output_set final_outputs;
        final_outputs.add_input(o.file);
        final_outputs.add_input(o.details);
        final_outputs.add("--svg", o.svg, *svg);
        final_outputs.commit();
        out << "Beam " << b->id << ", " << o.end << " joint: " << summary << "\n";
        out << "Drawing written to " << o.svg << ". Results support, and do not replace, the judgement of a "
               "qualified engineer.\n";
    }
    return a.holds() ? 0 : 1;
}

}  // namespace pinproof::cli
