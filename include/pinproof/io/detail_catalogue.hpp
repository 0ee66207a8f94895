// A firm's catalogue of standard beam-end details (format "pinproof-details/1",
// docs/batch-and-catalogues.md): each entry has an id, a type, the range of its
// initial rotational stiffness, optionally its design moment resistance, the
// geometry for the end-gap check and notes. Project files and schedules refer
// to an entry by its id.
//
// Stiffness in a catalogue is either absolute (N*m/rad, "rigid") or relative
// to the beam it is used on ("0.5 EI/L"); a relative value is resolved only
// when the entry is applied to a beam, with that beam's E, I and span.
#pragma once

#include <nlohmann/json.hpp>

#include <map>
#include <optional>
#include <string>
#include <string_view>
#include <vector>

#include "pinproof/core/errors.hpp"
#include "pinproof/model/joint.hpp"

namespace pinproof {

inline constexpr const char* detail_catalogue_format = "pinproof-details/1";

// One bound of a catalogue stiffness range.
struct catalogue_stiffness {
    enum class kind { absolute, rigid, relative };
    kind form = kind::absolute;
    double value = 0;  // N*m/rad for absolute; the multiple k of EI/L for relative
    // The bound for a beam of bending stiffness EI (N*m^2) and span (m).
    stiffness for_beam(double EI, double span) const;
};

struct catalogue_detail {
    std::string id;
    std::string type;         // "fin-plate", "web-cleats", "end-plate" or "custom"
    std::string description;
    catalogue_stiffness stiffness_min, stiffness_max;
    std::optional<double> moment_resistance;  // N*m
    // "from-detail": worked out for each beam from the entry's geometry (a fin
    // plate; joints/joint_from_detail.hpp); stiffness_min/max are then unused.
    bool stiffness_from_detail = false;
    bool moment_resistance_from_detail = false;
    // Kept as written, for readers that interpret them (connection_detail.hpp
    // reads `geometry` as a joint's `detail`): null when absent.
    nlohmann::json geometry;
    nlohmann::json stiffness_distribution;
    // The moment-rotation law (docs/method/joint-laws.md) as written, checked
    // when the catalogue is read; each beam reads it under its own standard.
    nlohmann::json behaviour;
    std::string notes;
    // The entry's "stiffness" and "moment_resistance" values as written, so that
    // a project file joint can be rewritten with the units it was given in.
    nlohmann::json stiffness_text;
    nlohmann::json moment_resistance_text;
    std::string pointer;  // JSON pointer of the entry in its file, e.g. "/details/3"
};

struct detail_catalogue {
    std::string format;  // "pinproof-details/1"
    std::string title;
    std::string source;  // file name, or "" when read from memory
    std::vector<catalogue_detail> details;
    // The entry with this id (exact match), or nullptr.
    const catalogue_detail* find(std::string_view id) const;
    // "FP-3-M20", "WC-2-M20", ... for messages, at most `limit` ids.
    std::string id_list(std::size_t limit = 12) const;
    // Every id, in catalogue order (for "did you mean").
    std::vector<std::string> ids() const;
    // Rebuilds the id index after `details` was changed (the readers do this).
    void rebuild_index();

private:
    std::map<std::string, std::size_t, std::less<>> index_;
};

// The names of detail types accepted in a catalogue, as written in a project
// file's connection detail ("fin-plate", "web-cleats", "end-plate", "custom").
const std::vector<std::string>& catalogue_detail_types();

// Reads a catalogue from parsed JSON. Throws input_error listing every problem,
// each with its JSON pointer (prefixed by `source` when given).
detail_catalogue read_detail_catalogue(const nlohmann::json& document, const std::string& source = "");

// Parses catalogue text; JSON syntax errors are reported with line and column.
detail_catalogue parse_detail_catalogue(std::string_view text, const std::string& source = "");

// Reads a catalogue file from disk.
detail_catalogue load_detail_catalogue_file(const std::string& path);

// The joint a catalogue entry gives a beam of bending stiffness EI and span.
joint joint_for_beam(const catalogue_detail& d, double EI, double span);

// Rewrites, in a parsed project file, every joint given as a string (a detail
// id, e.g. "joints": {"start": "FP-3-M20"}) into the inline joint of that
// entry: its stiffness and moment resistance as the catalogue wrote them and a
// description naming the detail. Joints already written inline are left
// alone. An id not in the catalogue is a problem at the joint's pointer
// ("/beams/2/joints/end"). Returns the number of joints rewritten.
std::size_t resolve_detail_references(nlohmann::json& project_document, const detail_catalogue& catalogue,
                                      problem_list& problems);

}  // namespace pinproof
