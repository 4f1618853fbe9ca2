package org.hobwright.api.host;

import java.nio.file.Path;
import java.util.List;
import org.hobwright.api.ApiStatus;
import org.hobwright.api.job.MachineProfile;

/**
 * The library a host session works with: the machine profiles, cycle templates, NC dialects and
 * cutting data saved in the library folder, over the read-only built-in sample scenario (a saved
 * file wins over a built-in one of the same name). Read only: a host saves through its own files
 * or the terminal tool. Nothing here throws for a missing or broken entry: it comes back as
 * findings.
 */
@ApiStatus(since = "1.1")
public interface HostLibrary {

    /** {@return the library folder} */
    Path home();

    /** {@return names of every machine profile, sorted} */
    List<String> machines();

    /**
     * The machine profile of that name.
     *
     * @param name the profile's name
     * @return the profile, or findings
     */
    Outcome<MachineProfile> machine(String name);

    /**
     * Names of the cycle templates of a machine, sorted.
     *
     * @param machine the machine's name
     * @return the names, empty for an unknown machine
     */
    List<String> templates(String machine);

    /**
     * The text of a cycle template file (its cycle keys, as in a job file).
     *
     * @param machine the machine it belongs to
     * @param name    the template's name
     * @return the JSON text, or findings
     */
    Outcome<String> template(String machine, String name);

    /** {@return names of every NC dialect, sorted} */
    List<String> dialects();

    /**
     * The text of a dialect file, as the NC writer takes it.
     *
     * @param name the dialect's name
     * @return the JSON text, or findings
     */
    Outcome<String> dialect(String name);

    /**
     * Every row of the cutting-data table the planner uses, sorted by work and hob material.
     *
     * @return the rows, or findings when the shop's table cannot be read
     */
    Outcome<List<CuttingRow>> cuttingData();

    /**
     * The cutting-data row for a work material and a hob material.
     *
     * @param workMaterial the work material key, e.g. {@code steel-free-machining}
     * @param hobMaterial  the hob material key, e.g. {@code hss-coated}
     * @return the row, or findings
     */
    Outcome<CuttingRow> cuttingData(String workMaterial, String hobMaterial);
}
