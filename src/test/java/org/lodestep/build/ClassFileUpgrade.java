package org.lodestep.build;

import java.io.IOException;
import java.io.InputStream;
import java.io.UncheckedIOException;
import java.net.URL;
import java.net.URLClassLoader;
import java.nio.file.Files;
import java.nio.file.Path;
import java.nio.file.StandardCopyOption;
import java.util.Enumeration;
import java.util.zip.ZipEntry;
import java.util.zip.ZipFile;
import java.util.zip.ZipOutputStream;

import org.objectweb.asm.ClassReader;
import org.objectweb.asm.ClassVisitor;
import org.objectweb.asm.ClassWriter;
import org.objectweb.asm.MethodVisitor;
import org.objectweb.asm.Opcodes;

/**
 * Rewrites the class files of the runnable jar that predate Java 6 (picocli, Commons Math and ASM ship them) as
 * Java 6 class files with stack-map frames, run on the jar after it is assembled ({@code package} phase).
 *
 * <p>Why: on Java 17 a static class-data archive holds such old classes but cannot verify them when it is made, so
 * the JVM verifies them at every start with its type-inferring verifier (JVMS 4.10.2); {@code leads identify} on a
 * sample spent about 28 ms of its 0.19 s there. A class file of version 50 with frames (JVMS 4.10.1) is verified
 * once, when the archive is made. The code is not changed: only the version and the frames ASM computes from it. A
 * frame ASM got wrong would cost only that saving: the archive leaves the class out, and at run time the JVM falls
 * back to the old verifier for a version-50 class ({@code ClassFileUpgradeTest} checks that none is left out). A
 * class whose code uses {@code jsr}/{@code ret}, for which ASM computes no frames, is left as it was. The
 * specification: references §31.
 */
public final class ClassFileUpgrade {
    private static final int OLDEST_WITH_FRAMES = Opcodes.V1_6;

    private ClassFileUpgrade() {
    }

    /** {@code args[0]}: the jar, rewritten in place (through a temporary file, moved over it when whole). */
    public static void main(String[] args) throws IOException {
        Path jar = Path.of(args[0]);
        Path tmp = jar.resolveSibling(jar.getFileName() + ".upgrade");
        int[] counts;
        try {
            counts = upgradeJar(jar, tmp);
        } catch (IOException | RuntimeException e) {
            Files.deleteIfExists(tmp);
            throw e;
        }
        Files.move(tmp, jar, StandardCopyOption.REPLACE_EXISTING, StandardCopyOption.ATOMIC_MOVE);
        System.out.println("class files upgraded to version 50: " + counts[0] + " (left as they were: " + counts[1]
                + ")");
    }

    /**
     * Copies {@code jar} to {@code out}, every entry in its order, each old class file upgraded.
     *
     * @return the class files upgraded, and those left old (their code uses subroutines)
     */
    static int[] upgradeJar(Path jar, Path out) throws IOException {
        int[] counts = new int[2];
        try (ZipFile in = new ZipFile(jar.toFile());
                URLClassLoader types = new URLClassLoader(new URL[] {jar.toUri().toURL()},
                        ClassLoader.getPlatformClassLoader());
                ZipOutputStream zip = new ZipOutputStream(Files.newOutputStream(out))) {
            Enumeration<? extends ZipEntry> entries = in.entries();
            while (entries.hasMoreElements()) {
                ZipEntry e = entries.nextElement();
                byte[] bytes;
                try (InputStream s = in.getInputStream(e)) {
                    bytes = s.readAllBytes();
                }
                if (isClass(e.getName()) && majorVersion(bytes) < OLDEST_WITH_FRAMES) {
                    byte[] upgraded = upgrade(bytes, types);
                    counts[upgraded == bytes ? 1 : 0]++;
                    bytes = upgraded;
                }
                ZipEntry copy = new ZipEntry(e.getName());
                copy.setTime(e.getTime());
                zip.putNextEntry(copy);
                zip.write(bytes);
                zip.closeEntry();
            }
        }
        return counts;
    }

    private static boolean isClass(String name) {
        return name.endsWith(".class") && !name.startsWith("META-INF/") && !name.endsWith("module-info.class");
    }

    /** The class file's major version (JVMS 4.1: after the magic number and the minor version). */
    static int majorVersion(byte[] classFile) {
        return classFile.length < 8 ? Integer.MAX_VALUE : (classFile[6] & 0xff) << 8 | (classFile[7] & 0xff);
    }

    /**
     * The class as a version-50 class file with frames, or {@code classFile} itself when its code uses subroutines.
     *
     * @param types resolves the common superclass of two types for a frame, without initialising either
     */
    static byte[] upgrade(byte[] classFile, ClassLoader types) {
        ClassReader reader = new ClassReader(classFile);
        if (usesSubroutines(reader)) {
            return classFile;
        }
        ClassWriter writer = new ClassWriter(ClassWriter.COMPUTE_FRAMES) {
            @Override
            protected ClassLoader getClassLoader() {
                return types;
            }

            @Override
            protected String getCommonSuperClass(String a, String b) {
                try {
                    return super.getCommonSuperClass(a, b);
                } catch (TypeNotPresentException | LinkageError | UncheckedIOException e) {
                    // A type the jar does not hold (an optional dependency): a frame naming Object may fail the new
                    // verifier, which then falls back to the old one for this class.
                    return "java/lang/Object";
                }
            }
        };
        reader.accept(new ClassVisitor(Opcodes.ASM9, writer) {
            @Override
            public void visit(int version, int access, String name, String signature, String superName,
                    String[] interfaces) {
                super.visit(OLDEST_WITH_FRAMES, access, name, signature, superName, interfaces);
            }
        }, ClassReader.SKIP_FRAMES);
        return writer.toByteArray();
    }

    private static boolean usesSubroutines(ClassReader reader) {
        boolean[] found = {false};
        reader.accept(new ClassVisitor(Opcodes.ASM9) {
            @Override
            public MethodVisitor visitMethod(int access, String name, String descriptor, String signature,
                    String[] exceptions) {
                return new MethodVisitor(Opcodes.ASM9) {
                    @Override
                    public void visitJumpInsn(int opcode, org.objectweb.asm.Label label) {
                        found[0] |= opcode == Opcodes.JSR;
                    }

                    @Override
                    public void visitVarInsn(int opcode, int varIndex) {
                        found[0] |= opcode == Opcodes.RET;
                    }
                };
            }
        }, ClassReader.SKIP_DEBUG | ClassReader.SKIP_FRAMES);
        return found[0];
    }
}
